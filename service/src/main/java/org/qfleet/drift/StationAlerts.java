package org.qfleet.drift;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The alert state of one station, whatever products it tests: the rules each product's charts fire
 * now, and the one alert they share. A fixture fault is one cause, so a station testing three
 * products raises one alert, which later rules (from any product) update, and which clears when no
 * product's chart fires any longer. Immutable.
 *
 * @param station station id
 * @param firing  rules firing now, by product (products with none are left out)
 * @param tracker the station's alert state machine; its product is the one whose charts raised the
 *                open episode
 */
public record StationAlerts(String station, Map<String, List<Rule>> firing, AlertTracker tracker) {

    public StationAlerts {
        firing = Map.copyOf(firing);
    }

    static StationAlerts start(String station) {
        return new StationAlerts(station, Map.of(), AlertTracker.idle(AlertKind.STATION, "", station));
    }

    /** The next state and the message to publish, after {@code product}'s charts showed {@code e}. */
    Step observe(String product, Evidence e) {
        Map<String, List<Rule>> now = new HashMap<>(firing);
        if (e.firing().isEmpty()) {
            now.remove(product);
        } else {
            now.put(product, List.copyOf(e.firing()));
        }
        Set<Rule> union = EnumSet.noneOf(Rule.class);
        now.values().forEach(union::addAll);
        List<Rule> rules = new ArrayList<>(union);
        AlertTracker t = tracker.open() == null
                ? new AlertTracker(AlertKind.STATION, product, station, tracker.episodes(), null)
                : tracker;
        AlertTracker.Step step = t.observe(new Evidence(rules, severity(rules), e.eventTime(), e.figures(), e.breakdown(), e.baseline()));
        return new Step(new StationAlerts(station, now, step.tracker()), step);
    }

    /** Two or more rules firing at once make a station's alert critical. */
    static Severity severity(List<Rule> rules) {
        return rules.size() >= 2 ? Severity.CRITICAL : Severity.WARNING;
    }

    record Step(StationAlerts alerts, AlertTracker.Step tracked) {
    }
}
