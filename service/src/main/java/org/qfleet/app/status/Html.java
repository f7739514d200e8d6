package org.qfleet.app.status;

import java.util.Locale;

/** Text and attribute values for the status page, which carries names that came from the network. */
final class Html {

    private Html() {
    }

    /**
     * Escapes markup characters for text and quoted attribute values, and drops characters that
     * XML 1.0 does not allow (its Char production, W3C Recommendation section 2.2), so the page
     * stays well-formed for HTML and XML parsers alike. Null gives the empty string.
     */
    static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length() + 16);
        text.codePoints().forEach(c -> {
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> {
                    if (allowedInXml(c)) {
                        out.appendCodePoint(c);
                    }
                }
            }
        });
        return out.toString();
    }

    /** A piece of an element id: letters, digits, {@code .}, {@code _} and {@code -} kept, anything else {@code _}. */
    static String idPart(String name) {
        return name == null || name.isEmpty() ? "_" : name.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    /** A number for people: NaN and infinities as a dash, else {@code decimals} places. */
    static String number(double value, int decimals) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%." + decimals + "f", value) : "\u2013";
    }

    private static boolean allowedInXml(int c) {
        return c == 0x9 || c == 0xA || c == 0xD
                || (c >= 0x20 && c <= 0xD7FF)
                || (c >= 0xE000 && c <= 0xFFFD)
                || (c >= 0x10000 && c <= 0x10FFFF);
    }
}
