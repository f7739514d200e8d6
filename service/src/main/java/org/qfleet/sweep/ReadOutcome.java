package org.qfleet.sweep;

/**
 * One input read from a file: either a sweep or the reason it is not one. A JSON Lines file gives
 * one outcome per line, any other file one outcome.
 *
 * @param source where it came from ({@code file.s2p}, or {@code file.jsonl:17} for a line)
 * @param sweep  the sweep, or null when {@code error} is set
 * @param error  why the input is unusable, or null
 */
public record ReadOutcome(String source, Sweep sweep, InvalidSweepException error) {

    public static ReadOutcome of(Sweep sweep) {
        return new ReadOutcome(sweep.source(), sweep, null);
    }

    public static ReadOutcome failed(String source, InvalidSweepException error) {
        return new ReadOutcome(source, null, error);
    }

    public boolean ok() {
        return sweep != null;
    }
}
