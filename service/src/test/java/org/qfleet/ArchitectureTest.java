package org.qfleet;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.Architectures.layeredArchitecture;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Keeps the package structure of the brief: the engine packages are a plain-Java library, and
 * packages depend downward only (app, stream, metrics above codec, drift, verdict, fit, sim, sweep).
 */
class ArchitectureTest {

    /** The plain-Java library: usable in any JVM pipeline, without Kafka, HTTP or a command line. */
    private static final String[] LIBRARY = {"org.qfleet.sweep..", "org.qfleet.fit..", "org.qfleet.sim..",
        "org.qfleet.drift..", "org.qfleet.verdict.."};

    private static final String[] OUTSIDE_THE_LIBRARY = {"org.apache.kafka..", "picocli..",
        "com.sun.net.httpserver..", "java.net.http..", "io.micrometer..", "org.qfleet.app..",
        "org.qfleet.stream..", "org.qfleet.metrics..", "org.qfleet.codec.."};

    private static JavaClasses production;

    @BeforeAll
    static void importClasses() {
        production = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.qfleet");
    }

    @Test
    void libraryPackagesStayFreeOfKafkaHttpMetricsAndTheCommandLine() {
        noClasses().that().resideInAnyPackage(LIBRARY)
                .should().dependOnClassesThat().resideInAnyPackage(OUTSIDE_THE_LIBRARY)
                .because("sweep, fit, sim, drift and verdict are the library a user can plug into any JVM pipeline")
                .check(production);
    }

    @Test
    void messageCodecsStayFreeOfKafkaAndTheCommandLine() {
        noClasses().that().resideInAPackage("org.qfleet.codec..")
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.kafka..", "picocli..", "org.qfleet.app..",
                        "org.qfleet.stream..", "org.qfleet.metrics..", "org.qfleet.sim..", "org.qfleet.drift..")
                .because("codec turns sweeps and results into the JSON of the contracts, for the command line and the stream alike")
                .check(production);
    }

    @Test
    void packagesDependDownwardOnly() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .withOptionalLayers(true)
                .layer("app").definedBy("org.qfleet.app..")
                .layer("stream").definedBy("org.qfleet.stream..")
                .layer("metrics").definedBy("org.qfleet.metrics..")
                .layer("codec").definedBy("org.qfleet.codec..")
                .layer("drift").definedBy("org.qfleet.drift..")
                .layer("verdict").definedBy("org.qfleet.verdict..")
                .layer("fit").definedBy("org.qfleet.fit..")
                .layer("sim").definedBy("org.qfleet.sim..")
                .layer("sweep").definedBy("org.qfleet.sweep..")
                .whereLayer("app").mayNotBeAccessedByAnyLayer()
                .whereLayer("stream").mayOnlyBeAccessedByLayers("app")
                .whereLayer("metrics").mayOnlyBeAccessedByLayers("app", "stream")
                .whereLayer("codec").mayOnlyBeAccessedByLayers("app", "stream", "metrics")
                .whereLayer("drift").mayOnlyBeAccessedByLayers("app", "stream", "metrics")
                .whereLayer("verdict").mayOnlyBeAccessedByLayers("app", "stream", "metrics")
                .whereLayer("fit").mayOnlyBeAccessedByLayers("app", "stream", "metrics", "codec", "drift", "verdict")
                .whereLayer("sim").mayOnlyBeAccessedByLayers("app")
                .whereLayer("sweep").mayOnlyBeAccessedByLayers("app", "stream", "metrics", "codec", "drift", "verdict", "fit", "sim")
                .check(production);
    }

    @Test
    void everyClassBelongsToAKnownPackage() {
        classes().should().resideInAnyPackage("org.qfleet.app..", "org.qfleet.stream..", "org.qfleet.metrics..",
                        "org.qfleet.codec..", "org.qfleet.drift..", "org.qfleet.verdict..", "org.qfleet.fit..", "org.qfleet.sim..", "org.qfleet.sweep..")
                .because("each box of the architecture has its own package, and nothing lives outside them")
                .check(production);
    }
}
