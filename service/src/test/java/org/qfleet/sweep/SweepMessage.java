package org.qfleet.sweep;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.StringJoiner;

/** Builds sweep messages for tests: a valid message whose fields can be replaced or removed. */
final class SweepMessage {

    static final double[] FREQUENCIES = {1.000e9, 1.001e9, 1.002e9, 1.003e9, 1.004e9, 1.005e9, 1.006e9};
    static final double[] RE = {0.01, 0.05, 0.2, 0.4, 0.2, 0.05, 0.01};
    static final double[] IM = {0.02, 0.1, 0.2, 0.0, -0.2, -0.1, -0.02};

    private final Map<String, String> fields = new LinkedHashMap<>();

    private SweepMessage() {
        fields.put("sweepId", "\"sw-0001\"");
        fields.put("stationId", "\"st-3\"");
        fields.put("product", "\"cavity-10g4\"");
        fields.put("lot", "\"L-2207\"");
        fields.put("unit", "\"U-000042\"");
        fields.put("measuredAt", "\"2024-05-17T09:30:00.125+02:00\"");
        fields.put("topology", "\"transmission\"");
        fields.put("frequencyHz", array(FREQUENCIES));
        fields.put("s21", "{\"re\":" + array(RE) + ",\"im\":" + array(IM) + "}");
    }

    static SweepMessage valid() {
        return new SweepMessage();
    }

    /** Sets a field to a raw JSON value (added at the end when it is new). */
    SweepMessage with(String name, String rawJson) {
        fields.put(name, rawJson);
        return this;
    }

    SweepMessage without(String name) {
        fields.remove(name);
        return this;
    }

    String json() {
        StringJoiner joiner = new StringJoiner(",", "{", "}");
        fields.forEach((name, value) -> joiner.add("\"" + name + "\":" + value));
        return joiner.toString();
    }

    byte[] bytes() {
        return json().getBytes(StandardCharsets.UTF_8);
    }

    static String array(double... values) {
        StringJoiner joiner = new StringJoiner(",", "[", "]");
        for (double v : values) {
            joiner.add(Double.toString(v));
        }
        return joiner.toString();
    }
}
