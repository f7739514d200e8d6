package org.qfleet.schema;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.networknt.schema.JsonSchema;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.qfleet.app.ResonanceFixtures;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.stream.Reject;
import org.qfleet.stream.RejectCodes;
import org.qfleet.stream.RejectJson;
import org.qfleet.stream.ResultMessageJson;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.verdict.Verdict;
import org.qfleet.verdict.VerdictReason;
import org.qfleet.verdict.VerdictStatus;

/** The schemas of the results and rejects topics against what the stream writes. */
class StreamMessageSchemaTest {

    private static JsonSchema resultSchema;
    private static JsonSchema rejectSchema;

    @BeforeAll
    static void loadSchemas() throws IOException {
        resultSchema = Schemas.load("result-message.schema.json");
        rejectSchema = Schemas.load("reject.schema.json");
    }

    @Test
    void resultMessagesWithEveryVerdictValidate() throws IOException {
        Sweep sweep = ResonanceFixtures.sweep("qfleet.sweeps/0@17", ResonanceFixtures.CAVITY, 51, 8,
                ResonanceFixtures.STATION_INFO, Topology.TRANSMISSION);
        ResonanceResult result = ResonanceFixtures.result(ResonanceFixtures.CAVITY, List.of(QualityFlag.LOW_SNR));
        List<Verdict> verdicts = List.of(Verdict.PASS, Verdict.UNKNOWN_PRODUCT, Verdict.fail(List.of(VerdictReason.values())));

        for (Verdict verdict : verdicts) {
            String json = new String(new ResultMessageJson().write(sweep, result, verdict), StandardCharsets.UTF_8);
            assertThat(Schemas.errors(resultSchema, json)).as(json).isEmpty();
        }
    }

    @Test
    void aResultWithoutTheSweepIdsOrTheVerdictIsNotAResultMessage() throws IOException {
        Sweep file = ResonanceFixtures.fileSweep("u.s2p", ResonanceFixtures.CAVITY);
        String line = new org.qfleet.codec.ResultJson().resultLine(file,
                ResonanceFixtures.result(ResonanceFixtures.CAVITY, List.of()));

        assertThat(Schemas.errors(resultSchema, line)).isNotEmpty();
    }

    @Test
    void resultMessageCarriesEveryFieldOfTheResultLine() throws IOException {
        List<String> lineFields = strings(Schemas.json("fit-result.schema.json").get("required"));
        List<String> messageFields = strings(Schemas.json("result-message.schema.json").get("required"));

        assertThat(messageFields).containsAll(lineFields)
                .contains("sweepId", "stationId", "product", "lot", "unit", "measuredAt", "verdict");
    }

    @Test
    void rejectsWithEveryCodeValidate() throws IOException {
        RejectJson json = new RejectJson(16);
        for (String code : RejectCodes.all()) {
            Reject reject = new Reject(code, "line 1, column 2: something specific", "sw-1", "qfleet.sweeps", 3, 1207,
                    "L2407".getBytes(StandardCharsets.UTF_8), "{\"sweepId\":\"sw-1\", and much more".getBytes(StandardCharsets.UTF_8));
            String text = new String(json.write(reject), StandardCharsets.UTF_8);
            assertThat(Schemas.errors(rejectSchema, text)).as(text).isEmpty();
        }
        Reject bare = new Reject(RejectCodes.OVERSIZED, "too big", null, "qfleet.sweeps", 0, 0, new byte[] {(byte) 0xff}, null);
        assertThat(Schemas.errors(rejectSchema, new String(json.write(bare), StandardCharsets.UTF_8))).isEmpty();
    }

    @Test
    void schemaEnumerationsMatchTheCode() throws IOException {
        JsonNode verdict = Schemas.json("result-message.schema.json").at("/properties/verdict/properties");
        assertThat(strings(verdict.at("/status/enum")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(VerdictStatus.values()).map(VerdictStatus::code).toList());
        assertThat(strings(verdict.at("/reasons/items/enum")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(VerdictReason.values()).map(VerdictReason::code).toList());
        assertThat(strings(Schemas.json("reject.schema.json").at("/properties/code/enum")))
                .containsExactlyInAnyOrderElementsOf(RejectCodes.all());
    }

    private static List<String> strings(JsonNode array) {
        List<String> values = new ArrayList<>();
        array.forEach(v -> values.add(v.asText()));
        return values;
    }
}
