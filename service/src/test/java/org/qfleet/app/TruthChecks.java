package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.networknt.schema.JsonSchema;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.qfleet.schema.Schemas;
import org.qfleet.sim.SimulatedSweep;

/** Checks of command output against the simulator's truth and against the published schemas. */
final class TruthChecks {

    private static JsonSchema resultSchema;
    private static JsonSchema errorSchema;

    private TruthChecks() {
    }

    /**
     * f0 and Qu of a result line within four stated standard uncertainties of the truth. The truth
     * is the circuit's own: f0 = 1 / (2 pi sqrt(LC)) and Qu = omega0 R C of the RLC resonator (Pozar,
     * Microwave Engineering, 4th ed., ch. 6). A Gaussian estimate lands outside 4 sigma with a
     * probability of 6e-5 (normal distribution tables), so a miss means the fit or its uncertainty
     * is wrong, not bad luck. The sigmas must be small for the band to mean anything: below 1 % of
     * the value for these 40 dB sweeps.
     */
    static void assertMatchesTruth(JsonNode line, SimulatedSweep simulated) {
        assertThat(line.has("error")).as("result expected, got %s", line).isFalse();
        double f0 = line.get("f0Hz").asDouble();
        double f0Sigma = line.get("f0UncertaintyHz").asDouble();
        double qu = line.get("qUnloaded").asDouble();
        double quSigma = line.get("qUnloadedUncertainty").asDouble();
        assertThat(f0Sigma).as("f0 uncertainty").isPositive().isLessThan(0.01 * f0 / line.get("qLoaded").asDouble());
        assertThat(quSigma).as("Qu uncertainty").isPositive().isLessThan(0.01 * qu);
        assertThat(Math.abs(f0 - simulated.truth().f0Hz())).as("f0 error, %s", line).isLessThanOrEqualTo(4 * f0Sigma);
        assertThat(Math.abs(qu - simulated.truth().qUnloaded())).as("Qu error, %s", line).isLessThanOrEqualTo(4 * quSigma);
    }

    /** The line validates against schemas/fit-result.schema.json. */
    static void assertValidResult(JsonNode line) {
        assertThat(errors(result(), line)).as(line.toString()).isEmpty();
    }

    /** The line validates against schemas/fit-error.schema.json. */
    static void assertValidError(JsonNode line) {
        assertThat(errors(error(), line)).as(line.toString()).isEmpty();
    }

    private static java.util.Set<?> errors(JsonSchema schema, JsonNode line) {
        try {
            return Schemas.errors(schema, line.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static synchronized JsonSchema result() {
        if (resultSchema == null) {
            resultSchema = load(Schemas.FIT_RESULT);
        }
        return resultSchema;
    }

    private static synchronized JsonSchema error() {
        if (errorSchema == null) {
            errorSchema = load(Schemas.FIT_ERROR);
        }
        return errorSchema;
    }

    private static JsonSchema load(String name) {
        try {
            return Schemas.load(name);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
