package org.qfleet.stream;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * The topics of the service.
 *
 * @param sweeps  sweep messages in (key: lot id)
 * @param results one result per fitted sweep (key: lot id)
 * @param rejects one reject per input that could not be processed, with the reason
 * @param alerts  drift alerts
 */
public record Topics(String sweeps, String results, String rejects, String alerts) {

    public static final Topics DEFAULT = new Topics("qfleet.sweeps", "qfleet.results", "qfleet.rejects", "qfleet.alerts");

    public Topics {
        for (String name : new String[] {sweeps, results, rejects, alerts}) {
            Objects.requireNonNull(name, "topic name");
            if (name.isBlank()) {
                throw new IllegalArgumentException("a topic name is blank");
            }
        }
        Set<String> distinct = new LinkedHashSet<>(List.of(sweeps, results, rejects, alerts));
        if (distinct.size() != 4) {
            throw new IllegalArgumentException("the four topics need four different names, got " + List.of(sweeps, results, rejects, alerts));
        }
    }

    public List<String> all() {
        return List.of(sweeps, results, rejects, alerts);
    }
}
