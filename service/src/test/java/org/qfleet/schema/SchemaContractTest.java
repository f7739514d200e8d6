package org.qfleet.schema;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.qfleet.app.ResonanceFixtures;
import org.qfleet.codec.ErrorCodes;
import org.qfleet.codec.ResultJson;
import org.qfleet.fit.CouplingRoute;
import org.qfleet.fit.Method;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;

/**
 * The JSON Schemas in {@code schemas/} against what the program writes and what it must accept:
 * every line {@link ResultJson} produces validates, and sample sweep messages validate or not as
 * the contract says.
 */
class SchemaContractTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final ResultJson JSON = new ResultJson();

    private static JsonSchema sweepSchema;
    private static JsonSchema resultSchema;
    private static JsonSchema errorSchema;

    @BeforeAll
    static void loadSchemas() throws IOException {
        sweepSchema = load("sweep.schema.json");
        resultSchema = load("fit-result.schema.json");
        errorSchema = load("fit-error.schema.json");
    }

    @Test
    void resultLinesOfFileAndMessageSweepsValidate() throws IOException {
        Sweep file = ResonanceFixtures.fileSweep("unit.s2p", ResonanceFixtures.CAVITY);
        Sweep message = ResonanceFixtures.sweep("qfleet.sweeps/0@17", ResonanceFixtures.CAVITY, 51, 8,
                ResonanceFixtures.STATION_INFO, Topology.TRANSMISSION);
        ResonanceResult result = ResonanceFixtures.result(ResonanceFixtures.CAVITY, List.of(QualityFlag.values()));

        assertValid(resultSchema, JSON.resultLine(file, result));
        assertValid(resultSchema, JSON.resultLine(message, result));
    }

    @Test
    void resultLinesWithUndeterminedQuantitiesValidate() throws IOException {
        Sweep sweep = ResonanceFixtures.sweep("x.s1p", ResonanceFixtures.CAVITY, 21, 8, SweepInfo.NONE, null);
        double nan = Double.NaN;
        ResonanceResult result = new ResonanceResult(nan, nan, nan, nan, nan, nan, nan, nan, nan, nan,
                Method.HALF_POWER, null, nan, Double.POSITIVE_INFINITY, List.of(), null);

        assertValid(resultSchema, JSON.resultLine(sweep, result));
    }

    @Test
    void everyMethodRouteAndTopologyValidates() throws IOException {
        for (Method method : Method.values()) {
            for (CouplingRoute route : CouplingRoute.values()) {
                for (Topology topology : Topology.values()) {
                    Sweep sweep = ResonanceFixtures.sweep("s.json", ResonanceFixtures.CAVITY, 11, 8, SweepInfo.NONE,
                            topology);
                    ResonanceResult r = ResonanceFixtures.result(ResonanceFixtures.CAVITY, List.of());
                    ResonanceResult varied = new ResonanceResult(r.f0Hz(), r.f0UncertaintyHz(), r.qLoaded(),
                            r.qLoadedUncertainty(), r.qUnloaded(), r.qUnloadedUncertainty(), r.qExternal(),
                            r.coupling1(), r.coupling2(), r.resonanceDb(), method, route, r.snrDb(),
                            r.residualRatio(), r.flags(), r.model());
                    assertValid(resultSchema, JSON.resultLine(sweep, varied));
                }
            }
        }
    }

    @Test
    void errorLinesWithEveryCodeValidate() throws IOException {
        for (String code : ErrorCodes.all()) {
            assertValid(errorSchema, JSON.errorLine("bad.s2p", "line 3: something specific", code));
        }
        assertValid(errorSchema, JSON.errorLine("bad.s2p", "no code given", null));
    }

    @Test
    void resultAndErrorLinesCannotBeMistakenForEachOther() throws IOException {
        String result = JSON.resultLine(ResonanceFixtures.fileSweep("u.s2p", ResonanceFixtures.CAVITY),
                ResonanceFixtures.result(ResonanceFixtures.CAVITY, List.of()));
        String error = JSON.errorLine("u.s2p", "flat trace", ErrorCodes.FIT_FAILED);

        assertThat(errors(errorSchema, result)).isNotEmpty();
        assertThat(errors(resultSchema, error)).isNotEmpty();
    }

    @Test
    void resultSchemaRequiresExactlyTheFieldsOfAFileResult() throws IOException {
        JsonNode line = MAPPER.readTree(JSON.resultLine(ResonanceFixtures.fileSweep("u.s2p", ResonanceFixtures.CAVITY),
                ResonanceFixtures.result(ResonanceFixtures.CAVITY, List.of())));

        assertThat(strings(schemaJson("fit-result.schema.json").get("required")))
                .containsExactlyInAnyOrderElementsOf(fieldNames(line));
    }

    @Test
    void schemaEnumerationsMatchTheCode() throws IOException {
        JsonNode result = schemaJson("fit-result.schema.json").get("properties");
        assertThat(strings(result.at("/method/enum")))
                .containsExactlyInAnyOrderElementsOf(codes(Method.values(), Method::code));
        assertThat(strings(result.at("/route/enum")))
                .containsExactlyInAnyOrderElementsOf(codes(CouplingRoute.values(), CouplingRoute::code));
        assertThat(strings(result.at("/flags/items/enum")))
                .containsExactlyInAnyOrderElementsOf(codes(QualityFlag.values(), QualityFlag::code));
        assertThat(strings(result.at("/topology/enum")))
                .containsExactlyInAnyOrderElementsOf(codes(Topology.values(), Topology::wireName));
        assertThat(strings(schemaJson("sweep.schema.json").at("/properties/topology/enum")))
                .containsExactlyInAnyOrderElementsOf(codes(Topology.values(), Topology::wireName));
        assertThat(strings(schemaJson("fit-error.schema.json").at("/properties/code/enum")))
                .containsExactlyInAnyOrderElementsOf(ErrorCodes.all());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("validMessages")
    void validSweepMessagesPass(String name, Consumer<ObjectNode> change) throws IOException {
        assertThat(errors(sweepSchema, message(change))).isEmpty();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("invalidMessages")
    void invalidSweepMessagesFail(String name, Consumer<ObjectNode> change) throws IOException {
        assertThat(errors(sweepSchema, message(change))).isNotEmpty();
    }

    static Stream<Arguments> validMessages() {
        return Stream.of(
                change("re/im trace", m -> { }),
                change("mag/deg trace", m -> m.set("s21", trace("mag", "deg"))),
                change("db/deg trace", m -> m.set("s21", trace("db", "deg"))),
                change("db-only trace", m -> m.set("s21", trace("db"))),
                change("notch", m -> m.put("topology", "notch")),
                change("reflection with s11", m -> {
                    m.put("topology", "reflection");
                    m.remove("s21");
                    m.set("s11", trace("re", "im"));
                }),
                change("all optional fields", m -> {
                    m.set("s11", trace("db", "deg"));
                    m.set("s22", trace("mag", "deg"));
                    m.put("temperatureC", 23.4);
                    m.put("fixtureId", "fx-7");
                }),
                change("extra field", m -> m.put("operator", "night shift")),
                change("time with offset", m -> m.put("measuredAt", "2025-03-14T10:26:53+01:00")));
    }

    static Stream<Arguments> invalidMessages() {
        List<Arguments> cases = new ArrayList<>();
        for (String field : List.of("sweepId", "stationId", "product", "lot", "unit", "measuredAt", "topology",
                "frequencyHz", "s21")) {
            cases.add(change("without " + field, m -> m.remove(field)));
        }
        cases.addAll(List.of(
                change("unknown topology", m -> m.put("topology", "sideways")),
                change("lot as a number", m -> m.put("lot", 2407)),
                change("empty sweep id", m -> m.put("sweepId", "")),
                change("measuredAt not a date-time", m -> m.put("measuredAt", "14.03.2025 09:26")),
                change("empty frequency array", m -> m.set("frequencyHz", MAPPER.createArrayNode())),
                change("frequency as strings", m -> m.set("frequencyHz", MAPPER.createArrayNode().add("1e9"))),
                change("re without im", m -> m.set("s21", trace("re"))),
                change("two forms mixed", m -> m.set("s21", trace("re", "im", "db"))),
                change("unknown form", m -> m.set("s21", trace("real", "imag"))),
                change("empty trace array", m -> ((ObjectNode) m.get("s21")).set("im", MAPPER.createArrayNode())),
                change("null in a trace", m -> ((ArrayNode) m.get("s21").get("re")).addNull()),
                change("reflection without s11", m -> m.put("topology", "reflection")),
                change("s22 in an unknown form", m -> m.set("s22", trace("phase")))));
        return cases.stream();
    }

    private static Arguments change(String name, Consumer<ObjectNode> change) {
        return Arguments.of(name, change);
    }

    /** A valid transmission message of the demo plant, changed as the case says. */
    private static String message(Consumer<ObjectNode> change) throws IOException {
        ObjectNode m = (ObjectNode) MAPPER.readTree("""
                {"sweepId": "sw-000123", "stationId": "st-04", "product": "cav-10g4", "lot": "L2407",
                 "unit": "u0042", "measuredAt": "2025-03-14T09:26:53.589Z", "topology": "transmission",
                 "frequencyHz": [10.399e9, 10.400e9, 10.401e9],
                 "s21": {"re": [0.05, 0.1, 0.05], "im": [0.05, 0.0, -0.05]}}
                """);
        change.accept(m);
        return MAPPER.writeValueAsString(m);
    }

    /** A trace with the given keys, each holding three numbers. */
    private static ObjectNode trace(String... keys) {
        ObjectNode t = MAPPER.createObjectNode();
        for (String key : keys) {
            t.set(key, MAPPER.createArrayNode().add(-20.5).add(-14.0).add(-20.5));
        }
        return t;
    }

    private static void assertValid(JsonSchema schema, String json) throws IOException {
        assertThat(errors(schema, json)).as(json).isEmpty();
    }

    private static Set<ValidationMessage> errors(JsonSchema schema, String json) throws IOException {
        return Schemas.errors(schema, json);
    }

    private static JsonSchema load(String name) throws IOException {
        return Schemas.load(name);
    }

    private static JsonNode schemaJson(String name) throws IOException {
        return Schemas.json(name);
    }

    private static List<String> strings(JsonNode array) {
        List<String> values = new ArrayList<>();
        array.forEach(v -> {
            if (!v.isNull()) {
                values.add(v.asText());
            }
        });
        return values;
    }

    private static Set<String> fieldNames(JsonNode node) {
        Set<String> names = new LinkedHashSet<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }

    private static <E> List<String> codes(E[] values, java.util.function.Function<E, String> code) {
        return Arrays.stream(values).map(code).toList();
    }
}
