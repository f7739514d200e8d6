package org.qfleet.verdict;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CatalogueFileTest {

    @TempDir
    Path dir;

    @Test
    void readsEveryLimitAndLeavesAbsentOnesUnset() throws Exception {
        Path file = write("{\"products\":[{\"product\":\"cav-x104\",\"qUnloadedMin\":5700,\"f0MinHz\":10.385e9,"
                + "\"f0MaxHz\":10.415e9,\"insertionLossMinDb\":20,\"insertionLossMaxDb\":30},"
                + "{\"product\":\"coax-s36\",\"qUnloadedMin\":855}]}");

        ProductCatalogue catalogue = CatalogueFile.read(file);

        assertThat(catalogue.limits("cav-x104")).contains(new ProductLimits("cav-x104", 5700.0, 10.385e9, 10.415e9, 20.0, 30.0));
        assertThat(catalogue.limits("coax-s36")).contains(new ProductLimits("coax-s36", 855.0, null, null, null, null));
    }

    @Test
    void readsAConfiguredBaselineForTheDriftMonitors() throws Exception {
        Path file = write("{\"products\":[{\"product\":\"cav-x104\",\"baseline\":{\"quMean\":6000,\"quSigma\":90,"
                + "\"f0MeanHz\":10.4e9,\"f0SigmaHz\":3e6}},{\"product\":\"coax-s36\"}]}");
        ProductCatalogue c = CatalogueFile.read(file);
        assertThat(c.baselines()).containsOnlyKeys("cav-x104");
        ProductBaseline b = c.baselines().get("cav-x104");
        assertThat(b.quMean()).isEqualTo(6000);
        assertThat(b.quSigma()).isEqualTo(90);
        assertThat(b.f0SigmaHz()).isEqualTo(3e6);
        assertThat(b.insertionLossMeanDb()).isNull();
        assertError("{\"products\":[{\"product\":\"a\",\"baseline\":{\"quMean\":6000}}]}", "\"quMean\" and \"quSigma\" are required");
        assertError("{\"products\":[{\"product\":\"a\",\"baseline\":{\"quMean\":6000,\"quSigma\":0}}]}", "must be finite and above 0");
        assertError("{\"products\":[{\"product\":\"a\",\"baseline\":{\"quMean\":6000,\"quSigma\":9,\"f0MeanHz\":1e9}}]}",
                "give both or neither");
        assertError("{\"products\":[{\"product\":\"a\",\"baseline\":{\"qu\":1}}]}", "unknown field \"qu\"");
    }

    @Test
    void errorsNameTheFileAndTheProblem() throws Exception {
        assertError("{\"products\":[{\"product\":\"a\",\"quMin\":5}]}", "unknown field \"quMin\"");
        assertError("{\"products\":[{\"product\":\"a\",\"qUnloadedMin\":\"high\"}]}", "product 'a': \"qUnloadedMin\" must be a number");
        assertError("{\"products\":[{\"qUnloadedMin\":5}]}", "products[0]: \"product\" must be a non-empty string");
        assertError("{\"products\":[{\"product\":\"a\",\"f0MinHz\":2,\"f0MaxHz\":1}]}", "f0MinHz (2.0) is above f0MaxHz (1.0)");
        assertError("{\"products\":[{\"product\":\"a\"},{\"product\":\"a\"}]}", "listed twice");
        assertError("{\"items\":[]}", "expected an object with a \"products\" array");
        assertError("{\"products\":[{\"product\":\"a\",\"qUnloadedMin\":NaN}]}", "invalid JSON at line 1");
        assertThatThrownBy(() -> CatalogueFile.read(dir.resolve("absent.json")))
                .isInstanceOf(InvalidCatalogueException.class).hasMessageContaining("absent.json: cannot read");
    }

    private void assertError(String json, String expected) throws Exception {
        Path file = write(json);
        assertThatThrownBy(() -> CatalogueFile.read(file))
                .isInstanceOf(InvalidCatalogueException.class)
                .hasMessageStartingWith(file.toString())
                .hasMessageContaining(expected);
    }

    private Path write(String json) throws Exception {
        return Files.writeString(Files.createTempFile(dir, "products", ".json"), json);
    }
}
