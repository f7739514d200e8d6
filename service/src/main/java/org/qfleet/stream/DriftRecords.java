package org.qfleet.stream;

import java.util.Arrays;

/** The lot stage's two kinds of output in one stream: a tag byte, then the JSON. */
final class DriftRecords {

    private static final byte ALERT = 'A';
    private static final byte STATION_INPUT = 'S';

    private DriftRecords() {
    }

    static byte[] alert(byte[] json) {
        return tagged(ALERT, json);
    }

    static byte[] stationInput(byte[] json) {
        return tagged(STATION_INPUT, json);
    }

    static boolean isAlert(byte[] value) {
        return value.length > 0 && value[0] == ALERT;
    }

    static boolean isStationInput(byte[] value) {
        return value.length > 0 && value[0] == STATION_INPUT;
    }

    static byte[] untagged(byte[] value) {
        return Arrays.copyOfRange(value, 1, value.length);
    }

    private static byte[] tagged(byte tag, byte[] json) {
        byte[] out = new byte[json.length + 1];
        out[0] = tag;
        System.arraycopy(json, 0, out, 1, json.length);
        return out;
    }
}
