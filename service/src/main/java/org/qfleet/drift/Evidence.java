package org.qfleet.drift;

import java.util.List;
import java.util.Map;

/** What a monitor found on one unit: the rules firing now, and the numbers to show. */
record Evidence(List<Rule> firing, Severity severity, long eventTime, Map<String, Double> figures,
        List<Breakdown> breakdown, Baseline baseline) {
}
