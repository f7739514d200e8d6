package org.qfleet.app.status;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertStatus;

/**
 * The most recent alert messages and the alerts raised now (the newest message of every key that
 * has not been cleared), both bounded: the oldest give way. A message older than one already seen
 * for its key (a transaction processed again) does not bring back an alert. Not thread-safe.
 */
final class AlertLog {

    private final int maxRecent;
    private final int maxRaised;
    private final ArrayDeque<Alert> recent = new ArrayDeque<>();
    private final LinkedHashMap<String, Alert> raised = new LinkedHashMap<>();
    private final LinkedHashMap<String, Integer> clearedRevisions = new LinkedHashMap<>();

    AlertLog(int maxRecent, int maxRaised) {
        if (maxRecent < 1 || maxRaised < 1) {
            throw new IllegalArgumentException("the alert log needs room for at least one alert, got " + maxRecent
                    + " recent and " + maxRaised + " raised");
        }
        this.maxRecent = maxRecent;
        this.maxRaised = maxRaised;
    }

    void add(Alert alert) {
        recent.addFirst(alert);
        while (recent.size() > maxRecent) {
            recent.removeLast();
        }
        if (alert.status() == AlertStatus.CLEARED) {
            raised.remove(alert.key());
            clearedRevisions.remove(alert.key());
            clearedRevisions.put(alert.key(), alert.revision());
            dropOldest(clearedRevisions, maxRaised);
            return;
        }
        Alert known = raised.get(alert.key());
        Integer cleared = clearedRevisions.get(alert.key());
        if ((known != null && known.revision() > alert.revision()) || (cleared != null && cleared > alert.revision())) {
            return;
        }
        raised.remove(alert.key());
        raised.put(alert.key(), alert);
        dropOldest(raised, maxRaised);
    }

    private static void dropOldest(LinkedHashMap<String, ?> map, int max) {
        Iterator<? extends Map.Entry<String, ?>> oldest = map.entrySet().iterator();
        while (map.size() > max) {
            oldest.next();
            oldest.remove();
        }
    }

    /** Newest first. */
    List<Alert> recent() {
        return List.copyOf(recent);
    }

    /** Newest first. */
    List<Alert> raised() {
        List<Alert> all = new ArrayList<>(raised.values());
        Collections.reverse(all);
        return List.copyOf(all);
    }
}
