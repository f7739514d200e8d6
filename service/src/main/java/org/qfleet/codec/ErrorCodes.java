package org.qfleet.codec;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.qfleet.sweep.SweepError;

/**
 * The {@code code} values of error lines: the sweep readers' reason codes ({@link SweepError})
 * plus the few the command adds itself. Stable: scripts and dashboards match on them.
 */
public final class ErrorCodes {

    /** A valid sweep in which no resonance could be fitted. */
    public static final String FIT_FAILED = "fit-failed";
    /** A failure of the program itself; {@code --debug} shows the stack trace. */
    public static final String INTERNAL_ERROR = "internal-error";
    /** A file or folder given on the command line holds nothing to fit. */
    public static final String NO_SWEEPS = "no-sweeps";
    /** A path that does not exist or cannot be read (same code as the readers use). */
    public static final String UNREADABLE = SweepError.UNREADABLE.code();

    private ErrorCodes() {
    }

    /** Every code an error line can carry. */
    public static List<String> all() {
        return readerCodesAnd(FIT_FAILED, INTERNAL_ERROR, NO_SWEEPS);
    }

    /** The readers' codes ({@link SweepError}) followed by {@code more}. */
    public static List<String> readerCodesAnd(String... more) {
        List<String> codes = new ArrayList<>();
        for (SweepError e : SweepError.values()) {
            codes.add(e.code());
        }
        codes.addAll(List.of(more));
        return Collections.unmodifiableList(codes);
    }
}
