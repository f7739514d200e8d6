package org.qfleet.sweep;

/**
 * Who measured what: the identifying fields of a sweep message. Files read from disk have none of
 * them ({@link #NONE}); the optional fields are null when absent.
 */
public record SweepInfo(
        String sweepId,
        String stationId,
        String product,
        String lot,
        String unit,
        String measuredAt,
        String fixtureId,
        Double temperatureC) {

    public static final SweepInfo NONE = new SweepInfo(null, null, null, null, null, null, null, null);
}
