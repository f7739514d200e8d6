package org.qfleet.app.status;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.Rule;

/** The table of recent alert messages, newest first, with the ones still raised marked. */
final class AlertTable {

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    /** @param raisedKeys keys of the alerts raised now */
    String render(List<Alert> recent, Set<String> raisedKeys, ChartIds ids) {
        if (recent.isEmpty()) {
            return "<p class=\"empty\">No alert since the service started.</p>\n";
        }
        StringBuilder html = new StringBuilder(recent.size() * 400);
        html.append("<table id=\"alert-table\" class=\"alert-table\">\n<thead><tr><th>time (UTC)</th><th>message</th>")
                .append("<th>kind</th><th>product</th><th>subject</th><th>rules</th><th>severity</th><th>evidence</th>")
                .append("<th>now</th></tr></thead>\n<tbody>\n");
        for (Alert a : recent) {
            boolean raisedNow = raisedKeys.contains(a.key());
            html.append("<tr class=\"alert-row ").append(a.status().code()).append(raisedNow ? " open" : "")
                    .append("\" data-key=\"").append(Html.escape(a.key())).append("\">")
                    .append(cell("time", time(a.eventTime())))
                    .append(cell("status", message(a)))
                    .append(cell("kind", a.kind().code()))
                    .append(cell("product", a.product()))
                    .append("<td class=\"subject\"><a href=\"#").append(Html.escape(chartId(a, ids))).append("\">")
                    .append(Html.escape(a.subject())).append("</a></td>")
                    .append(cell("rules", a.rules().stream().map(Rule::code).collect(Collectors.joining(", "))))
                    .append(cell("severity " + a.severity().code(), a.severity().code()))
                    .append(cell("evidence", evidence(a)))
                    .append(cell("now", raisedNow ? "raised" : "\u2013"))
                    .append("</tr>\n");
        }
        return html.append("</tbody>\n</table>\n").toString();
    }

    private static String chartId(Alert a, ChartIds ids) {
        return a.kind() == AlertKind.LOT ? ids.lot(a.product(), a.subject()) : ids.station(a.product(), a.subject());
    }

    private static String cell(String cssClass, String text) {
        return "<td class=\"" + cssClass + "\">" + Html.escape(text) + "</td>";
    }

    /** raised, updated (a later revision while raised), or cleared with the reason. */
    static String message(Alert a) {
        if (a.status() == AlertStatus.CLEARED) {
            return a.clearedBy() == null ? "cleared" : "cleared (" + a.clearedBy() + ")";
        }
        return a.revision() > 1 ? "updated" : "raised";
    }

    static String time(long epochMillis) {
        return epochMillis <= 0 ? "\u2013" : TIME.format(Instant.ofEpochMilli(epochMillis));
    }

    /** The figures behind the rules, in words. */
    static String evidence(Alert a) {
        Map<String, Double> f = a.figures();
        if (a.kind() == AlertKind.LOT) {
            return "n " + Html.number(figure(f, "n"), 0) + ", mean Qu " + Html.number(figure(f, "mean"), 1)
                    + ", X-bar limit " + Html.number(figure(f, "xbarLimit"), 1)
                    + ", lot limit " + Html.number(figure(f, "lotLimit"), 1);
        }
        double f0 = Math.max(figure(f, "f0CusumUpper"), figure(f, "f0CusumLower"));
        double coupling = Math.max(figure(f, "couplingCusumUpper"), figure(f, "couplingCusumLower"));
        return "n " + Html.number(figure(f, "n"), 0) + ", Qu EWMA " + Html.number(figure(f, "quEwma"), 2)
                + " (limit \u00b1" + Html.number(figure(f, "quEwmaLimit"), 2) + "), f0 CUSUM " + Html.number(f0, 1)
                + ", coupling CUSUM " + Html.number(coupling, 1) + " (h " + Html.number(figure(f, "cusumLimit"), 1) + ")";
    }

    private static double figure(Map<String, Double> figures, String name) {
        Double v = figures.get(name);
        return v == null ? Double.NaN : v;
    }
}
