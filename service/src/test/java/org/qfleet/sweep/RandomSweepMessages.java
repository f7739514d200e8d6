package org.qfleet.sweep;

import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Random sweep messages in the plain subset the fast path reads: every known field with a value of
 * its type, optional fields present or not, fields in any order, numbers in several JSON spellings
 * (extreme exponents, subnormals, negative zero, long mantissas), any JSON whitespace between tokens,
 * and unknown fields holding nested content. Messages from a fixed seed are always the same.
 */
final class RandomSweepMessages {

    private static final String[] WHITESPACE = {"", "", "", " ", "\n", "\t", "\r\n", "  \n\t "};
    private static final String[][] TRACE_KEYS = {{"re", "im"}, {"mag", "deg"}, {"db", "deg"}, {"db"}};
    private static final String[] TOPOLOGIES = {"transmission", "notch", "reflection"};
    private static final double[] SPECIAL = {0.0, -0.0, 1e-320, -1e-320, Double.MIN_VALUE, Double.MIN_NORMAL,
        Double.MAX_VALUE, -Double.MAX_VALUE, 0.1, 0.3, 1e22, 1e23, 9007199254740993.0, 2.2250738585072011e-308,
        1.0000000000000002, 0.35806402866636833, -6.551601734243408E-4};

    private final SplittableRandom random;

    RandomSweepMessages(long seed) {
        this.random = new SplittableRandom(seed);
    }

    /** The next message, as UTF-8 bytes. */
    byte[] next() {
        int points = random.nextInt(1, 25);
        List<String> fields = new ArrayList<>();
        for (String name : new String[] {"sweepId", "stationId", "product", "lot", "unit"}) {
            fields.add(field(name, text()));
        }
        fields.add(field("measuredAt", "\"2024-05-" + (10 + random.nextInt(20)) + "T09:30:0" + random.nextInt(10)
                + (random.nextBoolean() ? ".125Z\"" : "+02:00\"")));
        String topology = TOPOLOGIES[random.nextInt(TOPOLOGIES.length)];
        fields.add(field("topology", "\"" + topology + "\""));
        fields.add(field("frequencyHz", array(frequencies(points), false)));
        for (String trace : new String[] {"s11", "s21", "s12", "s22"}) {
            boolean needed = trace.equals(topology.equals("reflection") ? "s11" : "s21");
            if (needed || random.nextInt(3) == 0) {
                fields.add(field(trace, trace(points)));
            }
        }
        if (random.nextBoolean()) {
            fields.add(field("temperatureC", spelled(value(), true)));
        }
        if (random.nextBoolean()) {
            fields.add(field("fixtureId", text()));
        }
        for (int k = random.nextInt(4); k > 0; k--) {
            fields.add(field("extra" + k, other(0)));
        }
        Collections.shuffle(fields, new java.util.Random(random.nextLong()));
        return (ws() + "{" + String.join(",", fields) + ws() + "}" + ws()).getBytes(StandardCharsets.UTF_8);
    }

    private String field(String name, String value) {
        return ws() + "\"" + name + "\"" + ws() + ":" + ws() + value;
    }

    /** A non-blank string of printable ASCII without quotes or backslashes. */
    private String text() {
        StringBuilder text = new StringBuilder("\"").append((char) random.nextInt('A', 'Z' + 1));
        for (int k = random.nextInt(20); k > 0; k--) {
            char c = (char) random.nextInt(' ', '~' + 1);
            text.append(c == '"' || c == '\\' ? '_' : c);
        }
        return text.append('"').toString();
    }

    /** Strictly ascending positive frequencies, at any scale a double has. */
    private double[] frequencies(int points) {
        double[] f = new double[points];
        double scale = random.nextInt(3) == 0 ? Math.pow(10, random.nextInt(-320, 300)) : 1e9;
        f[0] = scale * random.nextDouble(0.5, 20);
        for (int i = 1; i < points; i++) {
            f[i] = Math.max(Math.nextUp(f[i - 1]), f[i - 1] + scale * random.nextDouble(0.001, 1));
        }
        return f;
    }

    private String trace(int points) {
        String[] keys = TRACE_KEYS[random.nextInt(TRACE_KEYS.length)].clone();
        if (keys.length == 2 && random.nextBoolean()) {
            keys = new String[] {keys[1], keys[0]};
        }
        List<String> members = new ArrayList<>();
        for (String key : keys) {
            boolean angle = key.equals("deg");
            boolean decibels = key.equals("db");
            double[] values = new double[points];
            for (int i = 0; i < points; i++) {
                values[i] = decibels ? random.nextDouble(-80, 3) : angle ? random.nextDouble(-180, 180) : value();
            }
            // decibels keep their spelling: a random one may be large enough to overflow as a magnitude
            members.add(ws() + "\"" + key + "\"" + ws() + ":" + ws() + array(values, !decibels));
        }
        return "{" + String.join(",", members) + ws() + "}";
    }

    private double value() {
        return switch (random.nextInt(6)) {
            case 0 -> random.nextDouble(-1, 1);
            case 1 -> finite(Double.longBitsToDouble(random.nextLong()));
            case 2 -> Double.longBitsToDouble(random.nextLong(1, 1L << 52)) * (random.nextBoolean() ? 1 : -1);
            case 3 -> SPECIAL[random.nextInt(SPECIAL.length)];
            case 4 -> random.nextDouble(-1, 1) * Math.pow(10, random.nextInt(-30, 30));
            default -> (double) random.nextLong(-1_000_000, 1_000_000);
        };
    }

    private static double finite(double value) {
        return Double.isFinite(value) ? value : 1.5;
    }

    /** The values as a JSON array; {@code anySpelling} allows texts that do not round-trip to the same double. */
    private String array(double[] values, boolean anySpelling) {
        StringBuilder json = new StringBuilder("[");
        for (int i = 0; i < values.length; i++) {
            json.append(i > 0 ? "," : "").append(ws()).append(spelled(values[i], anySpelling)).append(ws());
        }
        return json.append(']').toString();
    }

    private String spelled(double value, boolean anySpelling) {
        return switch (random.nextInt(anySpelling ? 5 : 3)) {
            case 0 -> Double.toString(value);
            case 1 -> String.format(Locale.ROOT, "%.17e", value);
            case 2 -> new BigDecimal(value).round(new MathContext(25)).toString();
            case 3 -> Long.toString((long) value);
            default -> randomDecimal();
        };
    }

    /** A number in JSON's grammar with up to 25 significant digits, from about 1e-345 to 1e307. */
    private String randomDecimal() {
        StringBuilder text = new StringBuilder(random.nextBoolean() ? "-" : "").append(random.nextInt(1, 10)).append('.');
        for (int k = random.nextInt(1, 25); k > 0; k--) {
            text.append((char) ('0' + random.nextInt(10)));
        }
        return text.append(random.nextBoolean() ? 'e' : 'E').append(random.nextInt(-345, 308)).toString();
    }

    /** An unknown field's value: any JSON, nested, with escapes in its strings. */
    private String other(int depth) {
        int kind = random.nextInt(depth < 4 ? 7 : 5);
        return switch (kind) {
            case 0 -> "\"" + new String[] {"", "kim", "a\\\"b", "tab\\tnew\\nline", "\\u00e9\\u20AC\\/\\\\", "\\b\\f\\r"}
                    [random.nextInt(6)] + "\"";
            case 1 -> spelled(value(), true);
            case 2 -> new String[] {"true", "false", "null"}[random.nextInt(3)];
            case 3 -> "1e999";
            case 4 -> "-0";
            case 5 -> {
                List<String> items = new ArrayList<>();
                for (int k = random.nextInt(4); k > 0; k--) {
                    items.add(ws() + other(depth + 1) + ws());
                }
                yield "[" + ws() + String.join(",", items) + "]";
            }
            default -> {
                List<String> members = new ArrayList<>();
                for (int k = random.nextInt(4); k > 0; k--) {
                    members.add(ws() + "\"k" + random.nextInt(3) + "\"" + ws() + ":" + ws() + other(depth + 1) + ws());
                }
                yield "{" + ws() + String.join(",", members) + "}";
            }
        };
    }

    private String ws() {
        return WHITESPACE[random.nextInt(WHITESPACE.length)];
    }
}
