package org.qfleet.verdict;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads a product catalogue from a JSON file:
 *
 * <pre>{@code
 * {"products": [
 *   {"product": "cav-x104", "qUnloadedMin": 5700, "f0MinHz": 10.385e9, "f0MaxHz": 10.415e9,
 *    "insertionLossMinDb": 20, "insertionLossMaxDb": 30,
 *    "baseline": {"quMean": 6000, "quSigma": 90, "f0MeanHz": 10.4e9, "f0SigmaHz": 3e6,
 *                 "insertionLossMeanDb": 25, "insertionLossSigmaDb": 1}}
 * ]}
 * }</pre>
 *
 * Every limit is optional; so is the baseline (the drift monitors' in-control figures; without it
 * they learn them from the product's first units), in which quMean and quSigma are required.
 * Unknown fields are an error, so a misspelt limit is not silently ignored.
 */
public final class CatalogueFile {

    private static final Set<String> FIELDS = Set.of("product", "qUnloadedMin", "f0MinHz", "f0MaxHz",
            "insertionLossMinDb", "insertionLossMaxDb", "baseline");
    private static final Set<String> BASELINE_FIELDS = Set.of("quMean", "quSigma", "f0MeanHz", "f0SigmaHz",
            "insertionLossMeanDb", "insertionLossSigmaDb");
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .disable(JsonParser.Feature.ALLOW_NON_NUMERIC_NUMBERS)
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);

    private CatalogueFile() {
    }

    /** Reads the catalogue, or explains in one line what is wrong with the file and where. */
    public static ProductCatalogue read(Path file) throws InvalidCatalogueException {
        JsonNode root;
        try {
            root = MAPPER.readTree(Files.readAllBytes(file));
        } catch (JsonProcessingException e) {
            throw new InvalidCatalogueException(file + ": invalid JSON at line " + e.getLocation().getLineNr()
                    + ": " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new InvalidCatalogueException(file + ": cannot read the product catalogue: " + e.getMessage());
        }
        if (root == null || !root.isObject() || !root.path("products").isArray()) {
            throw new InvalidCatalogueException(file + ": expected an object with a \"products\" array");
        }
        List<ProductLimits> limits = new ArrayList<>();
        Map<String, ProductBaseline> baselines = new HashMap<>();
        int index = 0;
        for (JsonNode entry : root.get("products")) {
            ProductLimits l = product(file, index++, entry);
            limits.add(l);
            if (entry.has("baseline")) {
                baselines.put(l.product(), baseline(file + ": product '" + l.product() + "' baseline", entry.get("baseline")));
            }
        }
        try {
            return new ProductCatalogue(limits, baselines);
        } catch (IllegalArgumentException e) {
            throw new InvalidCatalogueException(file + ": " + e.getMessage());
        }
    }

    private static ProductLimits product(Path file, int index, JsonNode entry) throws InvalidCatalogueException {
        String where = file + ": products[" + index + "]";
        if (!entry.isObject()) {
            throw new InvalidCatalogueException(where + " is not an object");
        }
        for (Iterator<String> names = entry.fieldNames(); names.hasNext(); ) {
            String name = names.next();
            if (!FIELDS.contains(name)) {
                throw new InvalidCatalogueException(where + ": unknown field \"" + name + "\"; known fields: "
                        + String.join(", ", FIELDS.stream().sorted().toList()));
            }
        }
        JsonNode id = entry.get("product");
        if (id == null || !id.isTextual() || id.asText().isBlank()) {
            throw new InvalidCatalogueException(where + ": \"product\" must be a non-empty string");
        }
        where = file + ": product '" + id.asText() + "'";
        try {
            return new ProductLimits(id.asText(), number(where, entry, "qUnloadedMin"), number(where, entry, "f0MinHz"),
                    number(where, entry, "f0MaxHz"), number(where, entry, "insertionLossMinDb"),
                    number(where, entry, "insertionLossMaxDb"));
        } catch (IllegalArgumentException e) {
            throw new InvalidCatalogueException(where + ": " + e.getMessage());
        }
    }

    private static ProductBaseline baseline(String where, JsonNode b) throws InvalidCatalogueException {
        if (!b.isObject()) {
            throw new InvalidCatalogueException(where + " is not an object");
        }
        for (Iterator<String> names = b.fieldNames(); names.hasNext(); ) {
            String name = names.next();
            if (!BASELINE_FIELDS.contains(name)) {
                throw new InvalidCatalogueException(where + ": unknown field \"" + name + "\"; known fields: "
                        + String.join(", ", BASELINE_FIELDS.stream().sorted().toList()));
            }
        }
        Double mean = number(where, b, "quMean");
        Double sigma = number(where, b, "quSigma");
        if (mean == null || sigma == null) {
            throw new InvalidCatalogueException(where + ": \"quMean\" and \"quSigma\" are required");
        }
        try {
            return new ProductBaseline(mean, sigma, number(where, b, "f0MeanHz"), number(where, b, "f0SigmaHz"),
                    number(where, b, "insertionLossMeanDb"), number(where, b, "insertionLossSigmaDb"));
        } catch (IllegalArgumentException e) {
            throw new InvalidCatalogueException(where + ": " + e.getMessage());
        }
    }

    private static Double number(String where, JsonNode entry, String name) throws InvalidCatalogueException {
        JsonNode value = entry.get(name);
        if (value == null || value.isNull()) {
            return null;
        }
        if (!value.isNumber()) {
            throw new InvalidCatalogueException(where + ": \"" + name + "\" must be a number, got " + value);
        }
        return value.asDouble();
    }
}
