package org.qfleet.schema;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.networknt.schema.JsonSchema;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.DriftEngine;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.PlantValues;
import org.qfleet.drift.Rule;
import org.qfleet.drift.Severity;
import org.qfleet.stream.AlertJson;

/** The alerts topic's schema against what the stream writes, and its enumerations against the Java enums. */
class AlertSchemaTest {

    @Test
    void raisedUpdatedAndClearedAlertsOfBothKindsValidate() throws IOException {
        JsonSchema schema = Schemas.load("alert.schema.json");
        PlantValues plant = new PlantValues(5, 4);
        List<Measurement> units = new ArrayList<>(plant.lot("L1", 100, 1.0));
        // a lot 2.5 % low (an X-bar signal), then 7 % (below the lot limit too: an update), with a faulty station
        units.addAll(plant.lot("L2", 60, 0.975, "st-02", new PlantValues.Fault(0, 0, 3)));
        units.addAll(plant.lot("L2", 90, 0.93, "st-02", new PlantValues.Fault(0, 0, 3)).stream()
                .map(m -> new Measurement(m.product(), m.lot(), m.station(), m.unit() + "-b", m.measuredAt(), m.qUnloaded(),
                        m.f0Hz(), m.levelDb(), m.flags())).toList());
        plant.pause(120);
        units.addAll(plant.lot("L3", 20, 1.0));
        DriftEngine engine = new DriftEngine(PlantValues.settings());
        List<Alert> alerts = new ArrayList<>();
        units.forEach(m -> alerts.addAll(engine.accept(m)));

        assertThat(alerts).extracting(Alert::kind).contains(AlertKind.LOT, AlertKind.STATION);
        assertThat(alerts).extracting(Alert::status).contains(AlertStatus.RAISED, AlertStatus.CLEARED);
        assertThat(alerts).anyMatch(a -> a.revision() > 1 && a.status() == AlertStatus.RAISED);
        for (Alert a : alerts) {
            String json = new String(new AlertJson().write(a), StandardCharsets.UTF_8);
            assertThat(Schemas.errors(schema, json)).as(json).isEmpty();
        }
    }

    @Test
    void theSchemaEnumerationsAreTheJavaEnums() throws IOException {
        JsonNode p = Schemas.json("alert.schema.json").get("properties");
        assertThat(codes(p.get("rules").get("items").get("enum")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(Rule.values()).map(Rule::code).toList());
        assertThat(codes(p.get("kind").get("enum")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(AlertKind.values()).map(AlertKind::code).toList());
        assertThat(codes(p.get("severity").get("enum")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(Severity.values()).map(Severity::code).toList());
        assertThat(codes(p.get("status").get("enum")))
                .containsExactlyInAnyOrderElementsOf(Arrays.stream(AlertStatus.values()).map(AlertStatus::code).toList());
    }

    private static List<String> codes(JsonNode array) {
        List<String> codes = new ArrayList<>();
        array.forEach(n -> codes.add(n.asText()));
        return codes;
    }
}
