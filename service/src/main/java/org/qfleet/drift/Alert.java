package org.qfleet.drift;

import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * One alert message: a state change of one episode of one cause. Consumers keep the message with
 * the highest {@code revision} per {@code key}; the same key never stands for another cause.
 *
 * @param key        stable key: {@code kind/product/subject/episode}
 * @param kind       lot or station
 * @param product    product id
 * @param subject    lot id or station id
 * @param episode    1 for the subject's first alert, then 2, ...
 * @param status     raised (also when updated) or cleared
 * @param revision   1 when raised, one more with every update and with the clearing
 * @param severity   highest severity of the episode so far
 * @param rules      rules that have fired during the episode, in order of first firing
 * @param clearedBy  why it cleared ({@code recovered}, {@code lot-closed}), null while raised
 * @param eventTime  measuredAt of the unit that caused the change, epoch milliseconds
 * @param figures    the numbers behind the rules (n, mean, limits, chart statistics)
 * @param breakdown  the other dimension: stations of the lot, or lots of the station
 * @param baseline   the baseline the rules measured against
 */
public record Alert(String key, AlertKind kind, String product, String subject, int episode, AlertStatus status,
        int revision, Severity severity, List<Rule> rules, String clearedBy, long eventTime,
        Map<String, Double> figures, List<Breakdown> breakdown, Baseline baseline) {

    public static final String RECOVERED = "recovered";
    public static final String LOT_CLOSED = "lot-closed";

    public Alert {
        Objects.requireNonNull(key, "key");
        rules = List.copyOf(rules);
        figures = Map.copyOf(figures);
        breakdown = List.copyOf(breakdown);
    }

    public static String key(AlertKind kind, String product, String subject, int episode) {
        return kind.code() + "/" + product + "/" + subject + "/" + episode;
    }
}
