package org.qfleet.app.status;

import java.time.Instant;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeMap;
import java.util.stream.Collectors;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.Rule;

/**
 * The status page as one self-contained document: inline style, inline SVG charts, no scripts, a
 * refresh every few seconds. Written as well-formed markup (every element closed, every text
 * escaped), so XML tools can read it as well as browsers.
 */
final class StatusHtml {

    static final int REFRESH_SECONDS = 5;

    private final LotChart lotChart = new LotChart();
    private final StationChart stationChart = new StationChart();
    private final AlertTable alertTable = new AlertTable();
    private final FitSection fitSection = new FitSection();

    String render(FleetSnapshot s, Instant now) {
        ChartIds ids = new ChartIds();
        StringBuilder html = new StringBuilder(256 * 1024);
        html.append("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">\n<head>\n")
                .append("<meta charset=\"utf-8\"/>\n")
                .append("<meta http-equiv=\"refresh\" content=\"").append(REFRESH_SECONDS).append("\"/>\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n")
                .append("<title>qfleet status</title>\n<style>\n").append(PageStyle.CSS).append("\n</style>\n</head>\n<body>\n")
                .append("<header><h1>qfleet status</h1><span class=\"stamp\">as of ")
                .append(Html.escape(AlertTable.time(now.toEpochMilli()))).append(" UTC, refreshed every ")
                .append(REFRESH_SECONDS).append(" s</span></header>\n<main>\n");
        summary(html, s);
        attention(html, s, ids);

        lotSection(html, "lots", "Open lots", "No open lot.", s.lots(), ids);
        lotSection(html, "closed-lots", "Recently closed lots", "No lot closed recently.", s.closedLots(), ids);
        html.append("<section id=\"stations\">\n<h2>Stations (").append(s.stations().size()).append(")</h2>\n");
        if (s.stations().isEmpty()) {
            html.append("<p class=\"empty\">No station has reported yet.</p>\n");
        } else {
            html.append("<div class=\"cards wide\">\n");
            for (StationView station : s.stations()) {
                html.append("<figure class=\"card station-card").append(station.alerted() ? " alerted" : "")
                        .append("\">\n<figcaption>").append(stationCaption(station)).append("</figcaption>\n")
                        .append(stationChart.render(station, ids.station(station.product(), station.station())))
                        .append("\n</figure>\n");
            }
            html.append("</div>\n");
        }
        Set<String> raisedKeys = s.raisedAlerts().stream().map(Alert::key).collect(Collectors.toCollection(HashSet::new));
        html.append("</section>\n<section id=\"alerts\">\n<h2>Recent alerts</h2>\n")
                .append(alertTable.render(s.recentAlerts(), raisedKeys, ids))
                .append("</section>\n<section id=\"last-fit\">\n<h2>Last fitted sweep</h2>\n")
                .append(fitSection.render(s.lastFit()))
                .append("</section>\n</main>\n</body>\n</html>\n");
        return html.toString();
    }

    /** The lots' cards; a lot's chart id is the same whether it is open or closed (it is never both). */
    private void lotSection(StringBuilder html, String id, String title, String none, List<LotView> lots, ChartIds ids) {
        html.append("<section id=\"").append(id).append("\">\n<h2>").append(title).append(" (").append(lots.size())
                .append(")</h2>\n");
        if (lots.isEmpty()) {
            html.append("<p class=\"empty\">").append(none).append("</p>\n</section>\n");
            return;
        }
        html.append("<div class=\"cards\">\n");
        for (LotView lot : lots) {
            html.append("<figure class=\"card lot-card").append(lot.closed() ? " closed-lot" : "")
                    .append(lot.highlighted() ? " alerted" : "").append("\">\n<figcaption>")
                    .append(lotCaption(lot)).append("</figcaption>\n")
                    .append(lotChart.render(lot, ids.lot(lot.product(), lot.lot()))).append("\n</figure>\n");
        }
        html.append("</div>\n</section>\n");
    }

    private static void summary(StringBuilder html, FleetSnapshot s) {
        long fails = s.verdicts().getOrDefault("fail", 0L);
        html.append("<ul class=\"tiles\" id=\"summary\">")
                .append(tile("sweeps fitted", s.sweepsFitted(), false))
                .append(tile("failed their limits", fails, false))
                .append(tile("rejected", s.sweepsRejected(), s.sweepsRejected() > 0))
                .append(tile("open lots", s.lots().size(), false))
                .append(tile("stations", s.stations().size(), false))
                .append(tile("alerts raised", s.raisedAlerts().size(), !s.raisedAlerts().isEmpty()))
                .append("</ul>\n");
        if (!s.rejectsByCode().isEmpty()) {
            html.append("<p class=\"rejects\">Rejects by reason: ").append(Html.escape(new TreeMap<>(s.rejectsByCode())
                    .entrySet().stream().map(e -> e.getKey() + " " + e.getValue()).collect(Collectors.joining(", "))))
                    .append("</p>\n");
        }
    }

    private static String tile(String name, long value, boolean hot) {
        return "<li" + (hot ? " class=\"hot\"" : "") + "><b>" + value + "</b>" + Html.escape(name) + "</li>";
    }

    private static void attention(StringBuilder html, FleetSnapshot s, ChartIds ids) {
        if (s.raisedAlerts().isEmpty()) {
            html.append("<div class=\"notice good\" id=\"attention\">No alert is raised: every charted lot and station is in control.</div>\n");
            return;
        }
        html.append("<div class=\"notice bad\" id=\"attention\"><b>Needs attention</b><ul>\n");
        for (Alert a : s.raisedAlerts()) {
            boolean lot = a.kind() == AlertKind.LOT;
            String id = lot ? ids.lot(a.product(), a.subject()) : ids.station(a.product(), a.subject());
            html.append("<li>").append(lot ? "lot " : "station ").append("<a href=\"#").append(Html.escape(id)).append("\">")
                    .append(Html.escape(a.subject())).append("</a> (").append(Html.escape(a.product())).append("): ")
                    .append(Html.escape(a.rules().stream().map(Rule::code).collect(Collectors.joining(", "))))
                    .append(", ").append(Html.escape(a.severity().code())).append(" since ")
                    .append(Html.escape(AlertTable.time(a.eventTime()))).append("</li>\n");
        }
        html.append("</ul></div>\n");
    }

    private static String lotCaption(LotView lot) {
        LotPoint latest = lot.latest();
        StringBuilder c = new StringBuilder();
        c.append("<b>").append(Html.escape(lot.lot())).append("</b> \u00b7 ").append(Html.escape(lot.product()));
        if (latest != null) {
            c.append(" \u00b7 ").append(latest.units()).append(" units, mean Qu ").append(Html.number(latest.mean(), 1))
                    .append(", X-bar limit ").append(Html.number(latest.xbarLimit(), 1));
        }
        if (lot.excluded() > 0) {
            c.append(" \u00b7 ").append(lot.excluded()).append(" excluded");
        }
        if (lot.closed()) {
            c.append(" \u00b7 <span class=\"closed-mark\">closed ")
                    .append(Html.escape(AlertTable.time(lot.closedAt().toEpochMilli()))).append(" UTC</span>");
        }
        if (lot.alerted()) {
            c.append(" \u00b7 <span class=\"flag\">").append(Html.escape(alertWords(lot.openAlert()))).append("</span>");
        } else if (lot.closed() && lot.hadAlert()) {
            c.append(" \u00b7 <span class=\"flag\">alerted while open, ").append(Html.escape(alertWords(lot.lastAlert())))
                    .append("</span>");
        }
        return c.toString();
    }

    private static String stationCaption(StationView station) {
        StationPoint latest = station.latest();
        StringBuilder c = new StringBuilder();
        c.append("<b>").append(Html.escape(station.station())).append("</b> \u00b7 ").append(Html.escape(station.product()));
        if (latest != null) {
            c.append(" \u00b7 ").append(latest.units()).append(" units charted, Qu EWMA ").append(Html.number(latest.quEwma(), 2));
        }
        if (station.excluded() > 0) {
            c.append(" \u00b7 ").append(station.excluded()).append(" excluded");
        }
        if (station.alerted()) {
            c.append(" \u00b7 <span class=\"flag\">").append(Html.escape(alertWords(station.openAlert()))).append("</span>");
        }
        return c.toString();
    }

    private static String alertWords(Alert a) {
        return a.severity().code() + ": " + a.rules().stream().map(Rule::code).collect(Collectors.joining(", "));
    }
}
