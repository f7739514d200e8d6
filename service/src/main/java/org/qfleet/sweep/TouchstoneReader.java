package org.qfleet.sweep;

import java.io.IOException;
import java.io.Reader;

/**
 * Reads 1- and 2-port S-parameter files in Touchstone 1.1 and 2.0 format into a {@link Sweep}:
 * frequencies in hertz, complex traces (Touchstone always carries phase), the reference impedance
 * of the file, no topology (the caller decides) and no {@link SweepInfo}. Y, Z, H and G parameters,
 * 3 or more ports, mixed-mode data and the Lower/Upper matrix formats are rejected. Errors name the
 * line they were found on.
 */
public final class TouchstoneReader {

    private final SweepLimits limits;

    public TouchstoneReader() {
        this(SweepLimits.DEFAULT);
    }

    public TouchstoneReader(SweepLimits limits) {
        this.limits = limits;
    }

    /**
     * Reads one file.
     *
     * @param source             name of the input, kept in the sweep
     * @param text               the file's text; read to the end (or the first error), not closed
     * @param portsFromExtension 1 for {@code .s1p}, 2 for {@code .s2p}; 0 when unknown, in which case
     *                           only a 2.0 file with [Number of Ports] can be read
     * @throws InvalidSweepException when the text is not a usable sweep, or cannot be read
     */
    public Sweep read(String source, Reader text, int portsFromExtension) throws InvalidSweepException {
        return read(source, text, portsFromExtension, -1);
    }

    /**
     * Reads one file like {@link #read(String, Reader, int)}, given its length in characters (or -1
     * when unknown), so that a file of ordinary size is read in one go.
     */
    Sweep read(String source, Reader text, int portsFromExtension, long length) throws InvalidSweepException {
        if (portsFromExtension < 0) {
            throw new IllegalArgumentException("portsFromExtension must be 0 (unknown) or more");
        }
        TextLines lines = length < 0 ? new TextLines(text) : new TextLines(text, length);
        try {
            return new TouchstoneParser(source, lines, limits, portsFromExtension).parse();
        } catch (IOException e) {
            throw new InvalidSweepException(SweepError.UNREADABLE, "cannot read " + source + ": " + e.getMessage(), e);
        }
    }
}
