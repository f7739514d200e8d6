package org.qfleet.schema;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SchemaValidatorsConfig;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;

/** The JSON Schemas in {@code schemas/} for tests: loading them and validating JSON text against them. */
public final class Schemas {

    public static final String SWEEP = "sweep.schema.json";
    public static final String FIT_RESULT = "fit-result.schema.json";
    public static final String FIT_ERROR = "fit-error.schema.json";

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private Schemas() {
    }

    /** A schema by file name, draft 2020-12, with format assertions (date-time) switched on. */
    public static JsonSchema load(String name) throws IOException {
        JsonSchemaFactory factory = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012);
        SchemaValidatorsConfig config = SchemaValidatorsConfig.builder().formatAssertionsEnabled(true).build();
        try (InputStream in = Files.newInputStream(folder().resolve(name))) {
            return factory.getSchema(in, config);
        }
    }

    /** The schema file itself as a JSON tree. */
    public static JsonNode json(String name) throws IOException {
        return MAPPER.readTree(folder().resolve(name).toFile());
    }

    /** What is wrong with {@code json} by the schema; empty when it is valid. */
    public static Set<ValidationMessage> errors(JsonSchema schema, String json) throws IOException {
        return schema.validate(MAPPER.readTree(json));
    }

    /** Set by the build (see the surefire configuration); a run from the module folder falls back to ../schemas. */
    private static Path folder() {
        return Path.of(System.getProperty("qfleet.schemas", "../schemas"));
    }
}
