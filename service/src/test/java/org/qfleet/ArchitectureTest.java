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
 * packages depend downward only (app, stream, metrics above drift, fit, sim, sweep).
 */
class ArchitectureTest {

    /** The plain-Java library: usable in any JVM pipeline, without Kafka, HTTP or a command line. */
    private static final String[] LIBRARY = {"org.qfleet.sweep..", "org.qfleet.fit..", "org.qfleet.sim..",
        "org.qfleet.drift.."};

    private static final String[] OUTSIDE_THE_LIBRARY = {"org.apache.kafka..", "picocli..",
        "com.sun.net.httpserver..", "java.net.http..", "io.micrometer..", "org.qfleet.app..",
        "org.qfleet.stream..", "org.qfleet.metrics.."};

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
                .because("sweep, fit, sim and drift are the library a user can plug into any JVM pipeline")
                .check(production);
    }

    @Test
    void packagesDependDownwardOnly() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .withOptionalLayers(true)
                .layer("app").definedBy("org.qfleet.app..")
                .layer("stream").definedBy("org.qfleet.stream..")
                .layer("metrics").definedBy("org.qfleet.metrics..")
                .layer("drift").definedBy("org.qfleet.drift..")
                .layer("fit").definedBy("org.qfleet.fit..")
                .layer("sim").definedBy("org.qfleet.sim..")
                .layer("sweep").definedBy("org.qfleet.sweep..")
                .whereLayer("app").mayNotBeAccessedByAnyLayer()
                .whereLayer("stream").mayOnlyBeAccessedByLayers("app")
                .whereLayer("metrics").mayOnlyBeAccessedByLayers("app", "stream")
                .whereLayer("drift").mayOnlyBeAccessedByLayers("app", "stream", "metrics")
                .whereLayer("fit").mayOnlyBeAccessedByLayers("app", "stream", "metrics", "drift")
                .whereLayer("sim").mayOnlyBeAccessedByLayers("app")
                .whereLayer("sweep").mayOnlyBeAccessedByLayers("app", "stream", "metrics", "drift", "fit", "sim")
                .check(production);
    }

    @Test
    void everyClassBelongsToAKnownPackage() {
        classes().should().resideInAnyPackage("org.qfleet.app..", "org.qfleet.stream..", "org.qfleet.metrics..",
                        "org.qfleet.drift..", "org.qfleet.fit..", "org.qfleet.sim..", "org.qfleet.sweep..")
                .because("each box of the architecture has its own package, and nothing lives outside them")
                .check(production);
    }
}
