package org.qfleet.app.status;

import java.util.Locale;
import org.qfleet.app.plot.SvgBuilder;

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
        return SvgBuilder.escape(text);
    }

    /** A piece of an element id: letters, digits, {@code .}, {@code _} and {@code -} kept, anything else {@code _}. */
    static String idPart(String name) {
        return name == null || name.isEmpty() ? "_" : name.replaceAll("[^A-Za-z0-9._-]", "_");
    }

    /** A number for people: NaN and infinities as a dash, else {@code decimals} places. */
    static String number(double value, int decimals) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, "%." + decimals + "f", value) : "\u2013";
    }
}
