package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;
import org.qfleet.verdict.ProductLimits;

/** The work on one message without Kafka: one outcome per input, whatever the input. */
class SweepHandlerTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private final StreamSettings settings = new StreamSettings(Topics.DEFAULT, "t", 1, new SweepLimits(7, 2001), 400_000, 1024,
            Map.of("bootstrap.servers", "localhost:1"));
    private final SweepHandler handler = new SweepHandler(settings, ProductCatalogue.demoPlant());

    @Test
    void aValidSweepGivesAResultMessageWithItsIdsAndVerdict() throws Exception {
        StreamSweeps.Message m = StreamSweeps.mixed(1, 4, "ok").get(0);

        SweepOutcome outcome = handler.handle("qfleet.sweeps/0@5", m.value());

        assertThat(outcome).isInstanceOf(SweepOutcome.Fitted.class);
        JsonNode json = MAPPER.readTree(((SweepOutcome.Fitted) outcome).json());
        assertThat(json.get("sweepId").asText()).isEqualTo(m.sweepId()).isEqualTo(((SweepOutcome.Fitted) outcome).sweepId());
        assertThat(json.get("source").asText()).isEqualTo("qfleet.sweeps/0@5");
        assertThat(json.get("lot").asText()).isEqualTo(m.key());
        assertThat(json.get("verdict").get("status").asText()).isEqualTo("pass");
    }

    @Test
    void aProductBelowItsQuLimitFailsWithTheReason() throws Exception {
        StreamSweeps.Message m = StreamSweeps.mixed(1, 4, "strict").get(0);
        // Every demo unit is far below a limit of a million.
        ProductCatalogue strict = new ProductCatalogue(List.of(
                new ProductLimits("cav-x104", 1e6, null, null, null, null)));

        SweepOutcome outcome = new SweepHandler(settings, strict).handle("s", m.value());

        JsonNode verdict = MAPPER.readTree(((SweepOutcome.Fitted) outcome).json()).get("verdict");
        assertThat(verdict.get("status").asText()).isEqualTo("fail");
        assertThat(verdict.get("reasons").get(0).asText()).isEqualTo("q-unloaded-below-limit");
    }

    @Test
    void aValidSweepWithoutAResonanceIsAFitFailureNamingTheSweep() {
        double[] f = new double[51];
        double[] flat = new double[51];
        for (int i = 0; i < f.length; i++) {
            f[i] = 1e9 + i * 1e5;
        }
        Arrays.fill(flat, 0.01);
        String message = "{\"sweepId\":\"flat-1\",\"stationId\":\"st-01\",\"product\":\"cav-x104\",\"lot\":\"L1\","
                + "\"unit\":\"U1\",\"measuredAt\":\"2025-03-14T09:00:00Z\",\"topology\":\"transmission\","
                + "\"frequencyHz\":" + Arrays.toString(f) + ",\"s21\":{\"db\":" + Arrays.toString(flat) + "}}";

        SweepOutcome outcome = handler.handle("s", message.getBytes(StandardCharsets.UTF_8));

        assertThat(outcome).isInstanceOfSatisfying(SweepOutcome.Failed.class, failed -> {
            assertThat(failed.code()).isEqualTo(RejectCodes.FIT_FAILED);
            assertThat(failed.sweepId()).isEqualTo("flat-1");
            assertThat(failed.message()).isNotBlank();
        });
    }

    @Test
    void largeMessagesAreRejectedBeforeDecodingAndEmptyOnesAreInvalid() {
        SweepOutcome big = handler.handle("s", new byte[400_001]);
        SweepOutcome none = handler.handle("s", null);

        assertThat(big).isEqualTo(new SweepOutcome.Failed(RejectCodes.OVERSIZED,
                "the message has 400001 bytes, more than the bound of 400000", null));
        assertThat(((SweepOutcome.Failed) none).code()).isEqualTo("invalid-json");
    }

    @Test
    void rejectsKeepABoundedPrefixOfThePayloadAndReadableKeysOnly() throws Exception {
        byte[] payload = new byte[5000];
        Arrays.fill(payload, (byte) 'x');
        RejectJson json = new RejectJson(1024);

        JsonNode reject = MAPPER.readTree(json.write(new Reject("oversized", "too big", null, "t", 1, 2,
                new byte[] {(byte) 0xc3, (byte) 0x28}, payload)));

        assertThat(java.util.Base64.getDecoder().decode(reject.get("payloadBase64").asText())).hasSize(1024);
        assertThat(reject.get("payloadBytes").asInt()).isEqualTo(5000);
        assertThat(reject.get("payloadTruncated").asBoolean()).isTrue();
        assertThat(reject.has("key")).as("a key that is not UTF-8 is left out").isFalse();
    }
}
