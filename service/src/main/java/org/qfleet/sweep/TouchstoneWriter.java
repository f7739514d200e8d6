package org.qfleet.sweep;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;

/**
 * Writes a sweep as a Touchstone 1.1 file: {@code .s1p} when S11 is its only trace, otherwise
 * {@code .s2p} in the 1.1 order S11 S21 S12 S22 with absent parameters written as 0. Numbers keep
 * full double precision. Magnitude-only traces are written with phase 0; in DB format a zero
 * magnitude is written as {@value #DB_FLOOR} dB.
 */
public final class TouchstoneWriter {

    /** What a magnitude of exactly 0 becomes in DB format (10^-20, far below any analyzer's noise). */
    public static final double DB_FLOOR = -400.0;

    private static final SParameter[] ONE_PORT = {SParameter.S11};
    private static final SParameter[] TWO_PORT = {SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22};

    private final FrequencyUnit unit;
    private final TouchstoneFormat format;

    public TouchstoneWriter(FrequencyUnit unit, TouchstoneFormat format) {
        this.unit = unit;
        this.format = format;
    }

    /** 1 when S11 is the sweep's only trace, else 2. */
    public static int ports(Sweep sweep) {
        return sweep.traces().size() == 1 && sweep.has(SParameter.S11) ? 1 : 2;
    }

    /** The file extension the sweep needs: {@code .s1p} or {@code .s2p}. */
    public static String extension(Sweep sweep) {
        return ".s" + ports(sweep) + "p";
    }

    /** Writes the sweep; the writer is flushed, not closed. */
    public void write(Sweep sweep, Writer out) throws IOException {
        SParameter[] order = ports(sweep) == 1 ? ONE_PORT : TWO_PORT;
        out.write("! " + ports(sweep) + "-port S-parameters, " + sweep.size() + " frequencies\n");
        out.write("# " + unit.symbol() + " S " + format.name() + " R " + sweep.referenceOhms() + "\n");
        StringBuilder line = new StringBuilder(256);
        double[] frequencies = sweep.frequencyHz();
        for (int i = 0; i < frequencies.length; i++) {
            line.setLength(0);
            line.append(frequencies[i] / unit.hertz());
            for (SParameter parameter : order) {
                Trace trace = sweep.traces().get(parameter);
                double re = trace == null ? 0.0 : trace.re()[i];
                double im = trace == null ? 0.0 : trace.im()[i];
                double first = format.first(re, im);
                if (format == TouchstoneFormat.DB && first == Double.NEGATIVE_INFINITY) {
                    first = DB_FLOOR;
                }
                line.append(' ').append(first).append(' ').append(format.second(re, im));
            }
            out.write(line.append('\n').toString());
        }
        out.flush();
    }

    /** The file's text. */
    public String toText(Sweep sweep) {
        StringWriter text = new StringWriter();
        try {
            write(sweep, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringWriter does not fail
        }
        return text.toString();
    }
}
