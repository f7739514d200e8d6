package org.qfleet.codec;

import static org.assertj.core.api.Assertions.assertThat;
import static org.qfleet.app.ResonanceFixtures.CAVITY;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.qfleet.app.ResonanceFixtures;
import org.qfleet.fit.CouplingRoute;
import org.qfleet.fit.Method;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;

class ResultJsonTest {

    private final ResultJson json = new ResultJson();
    private final ObjectMapper mapper = new ObjectMapper();

    @Test
    void resultLineCarriesEveryFieldUnderItsContractName() throws Exception {
        Sweep sweep = ResonanceFixtures.sweep("unit.s2p", CAVITY, 101, 10, SweepInfo.NONE, Topology.TRANSMISSION);
        ResonanceResult r = ResonanceFixtures.result(CAVITY, List.of(QualityFlag.LOW_SNR, QualityFlag.POOR_FIT));

        JsonNode line = mapper.readTree(json.resultLine(sweep, r));

        assertThat(fieldNames(line)).containsExactly("source", "f0Hz", "f0UncertaintyHz", "qLoaded",
                "qLoadedUncertainty", "qUnloaded", "qUnloadedUncertainty", "qExternal", "coupling1", "coupling2",
                "resonanceDb", "method", "route", "snrDb", "residualRatio", "flags", "topology", "points");
        assertThat(line.get("source").asText()).isEqualTo("unit.s2p");
        assertThat(line.get("f0Hz").asDouble()).isEqualTo(r.f0Hz());
        assertThat(line.get("f0UncertaintyHz").asDouble()).isEqualTo(r.f0UncertaintyHz());
        assertThat(line.get("qLoaded").asDouble()).isEqualTo(r.qLoaded());
        assertThat(line.get("qLoadedUncertainty").asDouble()).isEqualTo(r.qLoadedUncertainty());
        assertThat(line.get("qUnloaded").asDouble()).isEqualTo(r.qUnloaded());
        assertThat(line.get("qUnloadedUncertainty").asDouble()).isEqualTo(r.qUnloadedUncertainty());
        assertThat(line.get("qExternal").asDouble()).isEqualTo(r.qExternal());
        assertThat(line.get("coupling1").asDouble()).isEqualTo(r.coupling1());
        assertThat(line.get("coupling2").asDouble()).isEqualTo(r.coupling2());
        assertThat(line.get("resonanceDb").asDouble()).isEqualTo(r.resonanceDb());
        assertThat(line.get("snrDb").asDouble()).isEqualTo(r.snrDb());
        assertThat(line.get("residualRatio").asDouble()).isEqualTo(r.residualRatio());
        assertThat(line.get("method").asText()).isEqualTo("complex-circle");
        assertThat(line.get("route").asText()).isEqualTo("transmission-symmetric");
        assertThat(line.get("flags")).extracting(JsonNode::asText).containsExactly("low-snr", "poor-fit");
        assertThat(line.get("topology").asText()).isEqualTo("transmission");
        assertThat(line.get("points").asInt()).isEqualTo(101);
    }

    @Test
    void quantitiesThatAreNotFiniteBecomeNullAndNeverNanTokens() throws Exception {
        Sweep sweep = ResonanceFixtures.fileSweep("one-port.s1p", CAVITY);
        ResonanceResult r = new ResonanceResult(1e9, Double.NaN, 900, Double.POSITIVE_INFINITY, 950,
                Double.NaN, Double.NEGATIVE_INFINITY, 0.3, Double.NaN, -12, Method.LORENTZIAN,
                CouplingRoute.REFLECTION, Double.NaN, Double.NaN, List.of(), CAVITY);

        String text = json.resultLine(sweep, r);
        JsonNode line = mapper.readTree(text);

        assertThat(text).doesNotContain("NaN").doesNotContain("Infinity");
        for (String field : List.of("f0UncertaintyHz", "qLoadedUncertainty", "qUnloadedUncertainty", "qExternal",
                "coupling2", "snrDb", "residualRatio")) {
            assertThat(line.has(field)).as(field).isTrue();
            assertThat(line.get(field).isNull()).as(field).isTrue();
        }
        assertThat(line.get("coupling1").asDouble()).isEqualTo(0.3);
        assertThat(line.get("flags").isArray()).isTrue();
        assertThat(line.get("flags")).isEmpty();
        assertThat(line.get("topology").isNull()).as("a sweep without topology").isTrue();
    }

    @Test
    void messageSweepsAddTheirIdentifyingFields() throws Exception {
        Sweep sweep = ResonanceFixtures.sweep("qfleet.sweeps/3@1177", CAVITY, 51, 8,
                ResonanceFixtures.STATION_INFO, Topology.TRANSMISSION);

        JsonNode line = mapper.readTree(json.resultLine(sweep, ResonanceFixtures.result(CAVITY, List.of())));

        SweepInfo info = ResonanceFixtures.STATION_INFO;
        assertThat(line.get("sweepId").asText()).isEqualTo(info.sweepId());
        assertThat(line.get("stationId").asText()).isEqualTo(info.stationId());
        assertThat(line.get("product").asText()).isEqualTo(info.product());
        assertThat(line.get("lot").asText()).isEqualTo(info.lot());
        assertThat(line.get("unit").asText()).isEqualTo(info.unit());
        assertThat(line.get("measuredAt").asText()).isEqualTo(info.measuredAt());
        assertThat(line.get("fixtureId").asText()).isEqualTo(info.fixtureId());
        assertThat(line.get("temperatureC").asDouble()).isEqualTo(info.temperatureC());
    }

    @Test
    void fileSweepsWriteNoMessageFields() throws Exception {
        JsonNode line = mapper.readTree(json.resultLine(ResonanceFixtures.fileSweep("a.s2p", CAVITY),
                ResonanceFixtures.result(CAVITY, List.of())));

        assertThat(fieldNames(line)).doesNotContainAnyElementsOf(
                Set.of("sweepId", "stationId", "product", "lot", "unit", "measuredAt", "fixtureId", "temperatureC"));
    }

    @Test
    void errorLineCarriesSourceReasonAndCode() throws Exception {
        JsonNode line = mapper.readTree(json.errorLine("bad.s2p", "line 14: frequency 1.2e9 is not above 1.3e9",
                "not-ascending"));

        assertThat(fieldNames(line)).containsExactly("source", "error", "code");
        assertThat(line.get("source").asText()).isEqualTo("bad.s2p");
        assertThat(line.get("error").asText()).isEqualTo("line 14: frequency 1.2e9 is not above 1.3e9");
        assertThat(line.get("code").asText()).isEqualTo("not-ascending");
    }

    @Test
    void errorLineWithoutCodeOrReasonStaysValid() throws Exception {
        JsonNode line = mapper.readTree(json.errorLine("x.json", null, null));

        assertThat(fieldNames(line)).containsExactly("source", "error");
        assertThat(line.get("error").asText()).isNotBlank();
    }

    @Test
    void linesAreSingleLineAsciiWhateverTheSource() throws Exception {
        String source = "Prüfplatz \"7\"\nline two.s2p";
        String text = json.errorLine(source, "Güte zu klein", "fit-failed");

        assertThat(text).doesNotContain("\n").doesNotContain("\r");
        assertThat(text.chars().allMatch(c -> c < 128)).isTrue();
        assertThat(mapper.readTree(text).get("source").asText()).isEqualTo(source);
    }

    @Test
    void resultFieldsCanBeEmbeddedInAnotherWritersObject() throws Exception {
        StringWriter out = new StringWriter();
        try (JsonGenerator g = new JsonFactory().createGenerator(out)) {
            g.writeStartObject();
            g.writeStringField("verdict", "pass");
            ResultJson.writeResultFields(g, ResonanceFixtures.fileSweep("a.s2p", CAVITY),
                    ResonanceFixtures.result(CAVITY, List.of()));
            g.writeEndObject();
        }

        JsonNode node = mapper.readTree(out.toString());
        assertThat(node.get("verdict").asText()).isEqualTo("pass");
        assertThat(node.get("qLoaded").asDouble()).isEqualTo(CAVITY.qLoaded());
    }

    private static List<String> fieldNames(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
