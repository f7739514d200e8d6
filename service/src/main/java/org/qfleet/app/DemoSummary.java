package org.qfleet.app;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sim.DemoProduct;
import org.qfleet.sweep.Sweep;

/**
 * Tallies the fit of the demo's folder and tells a person how it went: files, fitted, failed, the
 * median Qu of each product next to the plant's nominal value, and where the plots are.
 */
final class DemoSummary implements FitListener {

    private static final String PREFIX = "qfleet demo: ";

    private final Map<String, DemoProduct> productOfFile;
    private final Map<DemoProduct, List<Double>> quOfProduct = new LinkedHashMap<>();
    private int fitted;
    private int failed;

    /** @param productOfFile the product of each demo file, by file name */
    DemoSummary(Map<String, DemoProduct> productOfFile) {
        this.productOfFile = Map.copyOf(productOfFile);
        for (DemoProduct product : productOfFile.values()) {
            quOfProduct.putIfAbsent(product, new ArrayList<>());
        }
    }

    @Override
    public void fitted(Sweep sweep, ResonanceResult result) {
        fitted++;
        DemoProduct product = productOfFile.get(fileName(sweep.source()));
        if (product != null && Double.isFinite(result.qUnloaded())) {
            quOfProduct.get(product).add(result.qUnloaded());
        }
    }

    @Override
    public void failed(String source, String code) {
        failed++;
    }

    /** Prints the summary lines. */
    void print(PrintWriter err, Path folder, Path plots) {
        err.println(PREFIX + "wrote " + productOfFile.size() + " sweep files of the invented demo plant to " + folder);
        err.println(PREFIX + fitted + " fitted, " + failed + " failed"
                + (failed > 0 ? " (the error lines on stdout say why)" : ""));
        List<String> medians = new ArrayList<>();
        quOfProduct.forEach((product, qu) -> {
            if (!qu.isEmpty()) {
                medians.add(String.format(Locale.ROOT, "%s %.0f over %d units (plant nominal %.0f)",
                        product.id(), median(qu), qu.size(), product.qUnloaded()));
            }
        });
        if (!medians.isEmpty()) {
            err.println(PREFIX + "median Qu: " + String.join("; ", medians));
        }
        err.println(PREFIX + "plots in " + plots);
        err.flush();
    }

    static double median(List<Double> values) {
        double[] sorted = values.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }

    /** The last element of a source path, whichever separator it uses. */
    private static String fileName(String source) {
        return source.substring(Math.max(source.lastIndexOf('/'), source.lastIndexOf('\\')) + 1);
    }
}
