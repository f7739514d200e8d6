package org.qfleet.app.status;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

/**
 * Element ids of the charts of one page: {@code lot-chart-<product>-<lot>} and
 * {@code station-chart-<product>-<station>}, with names reduced to safe characters
 * ({@link Html#idPart}) and a {@code -2}, {@code -3}, ... suffix when two names reduce to the same id.
 */
final class ChartIds {

    private final Map<String, String> assigned = new HashMap<>();
    private final Set<String> used = new HashSet<>();

    String lot(String product, String lot) {
        return id("lot-chart-", product, lot);
    }

    String station(String product, String station) {
        return id("station-chart-", product, station);
    }

    private String id(String prefix, String product, String subject) {
        return assigned.computeIfAbsent(prefix + product + '\u0000' + subject, k -> {
            String base = prefix + Html.idPart(product) + "-" + Html.idPart(subject);
            String id = base;
            for (int n = 2; !used.add(id); n++) {
                id = base + "-" + n;
            }
            return id;
        });
    }
}
