package org.qfleet.drift;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The alert state machine of one subject (a lot or a station): no alert, or one open alert. Rules
 * firing while none is open raise a new episode; more rules or a higher severity while one is open
 * update it (same key, next revision); nothing new gives no message; no rule firing any longer, or
 * the end of the subject, clears it. Immutable.
 *
 * @param kind     lot or station
 * @param product  product id
 * @param subject  lot or station id
 * @param episodes episodes raised so far
 * @param open     the open alert, or null
 */
public record AlertTracker(AlertKind kind, String product, String subject, int episodes, Alert open) {

    public static AlertTracker idle(AlertKind kind, String product, String subject) {
        return new AlertTracker(kind, product, subject, 0, null);
    }

    /** The next state and the message to publish, if any. */
    public record Step(AlertTracker tracker, Optional<Alert> message) {
    }

    Step observe(Evidence e) {
        if (e.firing().isEmpty()) {
            return open == null ? new Step(this, Optional.empty()) : clear(Alert.RECOVERED, e);
        }
        if (open == null) {
            int episode = episodes + 1;
            Alert raised = new Alert(Alert.key(kind, product, subject, episode), kind, product, subject, episode,
                    AlertStatus.RAISED, 1, e.severity(), e.firing(), null, e.eventTime(), e.figures(), e.breakdown(),
                    e.baseline());
            return new Step(new AlertTracker(kind, product, subject, episode, raised), Optional.of(raised));
        }
        List<Rule> rules = new ArrayList<>(open.rules());
        for (Rule r : e.firing()) {
            if (!rules.contains(r)) {
                rules.add(r);
            }
        }
        boolean moreRules = rules.size() > open.rules().size();
        boolean worse = e.severity().compareTo(open.severity()) > 0;
        if (!moreRules && !worse) {
            return new Step(this, Optional.empty());
        }
        Alert updated = new Alert(open.key(), kind, product, subject, open.episode(), AlertStatus.RAISED,
                open.revision() + 1, worse ? e.severity() : open.severity(), rules, null, e.eventTime(), e.figures(),
                e.breakdown(), e.baseline());
        return new Step(new AlertTracker(kind, product, subject, episodes, updated), Optional.of(updated));
    }

    /** Clears the open alert, if there is one, because of {@code reason}. */
    Step clear(String reason, Evidence e) {
        if (open == null) {
            return new Step(this, Optional.empty());
        }
        Alert cleared = new Alert(open.key(), kind, product, subject, open.episode(), AlertStatus.CLEARED,
                open.revision() + 1, open.severity(), open.rules(), reason, e.eventTime(), e.figures(), e.breakdown(),
                e.baseline());
        return new Step(new AlertTracker(kind, product, subject, episodes, null), Optional.of(cleared));
    }
}
