package org.qfleet.app.status;

import static org.assertj.core.api.Assertions.assertThat;

import com.sun.net.httpserver.HttpServer;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.LotStatistics;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.PlantValues;
import org.qfleet.drift.UnitValue;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.ProductCatalogue;
import org.w3c.dom.Element;

class StatusPageTest {

    private static final String LOW_LOT = "L2";
    private static final String LOOSE_STATION = "st-03";

    private final HttpClient client = HttpClient.newHttpClient();
    private HttpServer server;

    @AfterEach
    void stop() {
        if (server != null) {
            server.stop(0);
        }
    }

    @Test
    void thePageIsWellFormedWithOneChartPerOpenOrClosedLotAndStationDrawingEveryKeptPoint() throws Exception {
        FleetView view = plantView();
        FleetSnapshot snapshot = view.snapshot();
        HttpResponse<String> response = get(serve(view, "/"), "GET");

        assertThat(response.statusCode()).isEqualTo(200);
        assertThat(response.headers().firstValue("Content-Type")).hasValue("text/html; charset=utf-8");
        assertThat(response.headers().firstValue("Content-Security-Policy")).hasValueSatisfying(
                policy -> assertThat(policy).contains("default-src 'none'").doesNotContain("script-src"));
        PageDocument page = PageDocument.parse(response.body());
        assertThat(page.elements("meta", null)).anySatisfy(m -> {
            assertThat(m.getAttribute("http-equiv")).isEqualTo("refresh");
            assertThat(m.getAttribute("content")).isEqualTo("5");
        });
        assertThat(page.elements("script", null)).isEmpty();
        assertThat(response.body()).doesNotContain("src=", "href=\"http");

        List<LotView> lots = new ArrayList<>(snapshot.lots());
        lots.addAll(snapshot.closedLots());
        assertThat(snapshot.closedLots()).as("L1 and L3 closed by the units of the lots after them").hasSize(2);
        List<Element> lotCharts = page.elements("svg", "lot-chart");
        assertThat(lotCharts).hasSize(lots.size()).hasSize(3);
        for (LotView lot : lots) {
            Element chart = page.byId("lot-chart-" + lot.product() + "-" + lot.lot());
            assertThat(chart).as("chart of lot %s", lot.lot()).isNotNull();
            assertThat(chart.getNamespaceURI()).isEqualTo("http://www.w3.org/2000/svg");
            assertThat(chart.getAttribute("class").split(" ")).as("closed-lot class").containsOnlyOnce("lot-chart")
                    .matches(classes -> List.of(classes).contains("closed-lot") == lot.closed());
            List<Element> mean = PageDocument.elementsIn(chart, "polyline", "lot-mean");
            assertThat(mean).hasSize(1);
            assertThat(PageDocument.vertices(mean.get(0))).isEqualTo(lot.points().size());
            assertThat(PageDocument.elementsIn(chart, "polyline", "xbar-limit")).hasSize(1);
            assertThat(PageDocument.elementsIn(chart, "line", "lot-limit")).isNotEmpty();
            assertThat(PageDocument.elementsIn(chart, "line", "mu0-line")).isNotEmpty();
            long below = lot.points().stream().filter(p -> p.below(lot.lotLimit())).count();
            assertThat(PageDocument.elementsIn(chart, "circle", "below-limit")).hasSize((int) below);
        }
        List<Element> stationCharts = page.elements("svg", "station-chart");
        assertThat(stationCharts).hasSize(snapshot.stations().size()).hasSize(4);
        for (StationView station : snapshot.stations()) {
            Element chart = page.byId("station-chart-" + station.product() + "-" + station.station());
            assertThat(chart).isNotNull();
            for (String series : List.of("ewma-z", "cusum-f0-upper", "cusum-f0-lower", "cusum-coupling-upper",
                    "cusum-coupling-lower")) {
                List<Element> line = PageDocument.elementsIn(chart, "polyline", series);
                assertThat(line).as(series).hasSize(1);
                assertThat(PageDocument.vertices(line.get(0))).isEqualTo(station.points().size());
            }
            assertThat(PageDocument.elementsIn(chart, "line", "ewma-limit")).hasSize(2 + 1);
            assertThat(PageDocument.elementsIn(chart, "line", "cusum-h")).hasSize(1 + 1);
        }
        Element fit = page.byId("fit-plot");
        assertThat(fit).as("the plot of the last fit, inline").isNotNull();
        assertThat(fit.getLocalName()).isEqualTo("svg");
        assertThat(PageDocument.elementsIn(fit, "polyline", "fit")).isNotEmpty();
    }

    @Test
    void theDriftingLotAndTheFaultyStationAreHighlightedListedFirstAndNamedInTheAlertTable() throws Exception {
        FleetView view = plantView();
        PageDocument page = PageDocument.parse(get(serve(view, "/"), "GET").body());

        Element firstLot = page.elements("svg", "lot-chart").get(0);
        assertThat(firstLot.getAttribute("data-lot")).isEqualTo(LOW_LOT);
        assertThat(firstLot.getAttribute("class")).contains("alerted");
        assertThat(page.elements("figure", "alerted")).hasSize(2);
        Element firstStation = page.elements("svg", "station-chart").get(0);
        assertThat(firstStation.getAttribute("data-station")).isEqualTo(LOOSE_STATION);
        assertThat(firstStation.getAttribute("class")).contains("alerted");

        List<Element> rows = page.elements("tr", "alert-row");
        assertThat(rows).isNotEmpty();
        assertThat(rows).anySatisfy(r -> {
            assertThat(r.getAttribute("class")).contains("raised", "open");
            assertThat(r.getTextContent()).contains("lot", LOW_LOT, "lot-mean-below-xbar-limit");
        });
        assertThat(rows).anySatisfy(r -> assertThat(r.getTextContent()).contains("station", LOOSE_STATION, "coupling-cusum"));
        assertThat(page.byId("attention").getTextContent()).contains(LOW_LOT, LOOSE_STATION);
    }

    @Test
    void aClosedLotThatDriftedStaysOnThePageAfterTheOpenLotsHighlightedAndMarkedClosed() throws Exception {
        Instant closing = Instant.parse("2026-03-02T09:30:00Z");
        FleetView view = new FleetView(FleetView.Limits.DEFAULT, Clock.fixed(closing, ZoneOffset.UTC));
        PlantFeed feed = new PlantFeed(PlantValues.settings(), view);
        PlantValues plant = new PlantValues(21, 4);
        feed.measurements(plant.lot("L1", 150, 1.0));
        feed.measurements(plant.lot(LOW_LOT, 120, 0.96));
        feed.measurements(plant.lot("L3", 100, 1.0));
        assertThat(feed.alerts()).as("the low lot was alerted, and its alert cleared when it closed")
                .anySatisfy(a -> assertThat(a.subject()).isEqualTo(LOW_LOT))
                .noneSatisfy(a -> assertThat(view.snapshot().raisedAlerts()).contains(a));
        FleetSnapshot snapshot = view.snapshot();
        assertThat(snapshot.lots()).extracting(LotView::lot).containsExactly("L3");
        assertThat(snapshot.closedLots()).extracting(LotView::lot).containsExactly(LOW_LOT, "L1");

        PageDocument page = PageDocument.parse(get(serve(view, "/"), "GET").body());
        Element closedSection = page.byId("closed-lots");
        assertThat(closedSection.getTextContent()).contains("Recently closed lots (2)");
        List<Element> closedCharts = PageDocument.elementsIn(closedSection, "svg", "lot-chart");
        assertThat(closedCharts).extracting(c -> c.getAttribute("data-lot")).containsExactly(LOW_LOT, "L1");
        assertThat(closedCharts).allSatisfy(c -> assertThat(c.getAttribute("class").split(" ")).contains("closed-lot"));
        Element low = page.byId("lot-chart-" + PlantValues.PRODUCT + "-" + LOW_LOT);
        assertThat(low).isSameAs(closedCharts.get(0));
        assertThat(low.getAttribute("class").split(" ")).contains("alerted");
        assertThat(closedCharts.get(1).getAttribute("class").split(" ")).doesNotContain("alerted");
        assertThat(PageDocument.vertices(PageDocument.elementsIn(low, "polyline", "lot-mean").get(0)))
                .isEqualTo(snapshot.closedLots().get(0).points().size()).isPositive();
        List<Element> closedCards = PageDocument.elementsIn(closedSection, "figure", "closed-lot");
        assertThat(closedCards).hasSize(2);
        assertThat(closedCards.get(0).getAttribute("class").split(" ")).contains("alerted");
        assertThat(closedCards.get(0).getTextContent()).contains("closed 2026-03-02 09:30:00 UTC",
                "alerted while open", "lot-mean-below-xbar-limit");

        Element openChart = PageDocument.elementsIn(page.byId("lots"), "svg", "lot-chart").get(0);
        assertThat(openChart.getAttribute("class")).isEqualTo("lot-chart");
        assertThat(page.elements("svg", "lot-chart")).extracting(c -> c.getAttribute("id")).doesNotHaveDuplicates()
                .hasSize(3);
        assertThat(page.byId("attention").getTextContent()).as("no alert is raised now").doesNotContain(LOW_LOT);
    }

    @Test
    void needsAttentionNamesAClosedLotWhoseAlertIsStillRaisedAndLinksToItsChart() throws Exception {
        FleetView view = new FleetView();
        FleetViewTest.feedLot(view, "L1", 12);
        view.alertPublished(FleetViewTest.lotAlert("L1", AlertStatus.RAISED, 1));
        view.lotClosed(PlantValues.PRODUCT, "L1");
        PageDocument page = PageDocument.parse(get(serve(view, "/"), "GET").body());
        String id = "lot-chart-" + PlantValues.PRODUCT + "-L1";
        assertThat(page.byId(id).getAttribute("class")).isEqualTo("lot-chart closed-lot alerted");
        List<Element> links = PageDocument.elementsIn(page.byId("attention"), "a", null);
        assertThat(links).extracting(a -> a.getAttribute("href")).containsExactly("#" + id);
    }

    @Test
    void namesFromTheNetworkAreEscaped() throws Exception {
        String hostile = "<script>alert('x')</script>";
        String station = "st\"><img src=x onerror=y>";
        FleetView view = new FleetView();
        Baseline b = PlantValues.baseline();
        LotStatistics stats = LotStatistics.EMPTY.plus(UnitValue.of(new Measurement("p&q", hostile, station, "u1", 0, 6000,
                PlantValues.F0, PlantValues.LEVEL, List.of())), null);
        view.lotUpdated(new LotState("p&q", hostile, stats, 0, 0, 0, LotState.open("p&q", hostile).alerts()), b);
        view.alertPublished(FleetViewTest.lotAlert(hostile, AlertStatus.RAISED, 1));
        String hostileClosed = "</title><script>x()</script>&amp;";
        FleetViewTest.feedAlertedLot(view, hostileClosed);
        view.lotClosed(PlantValues.PRODUCT, hostileClosed);
        String body = get(serve(view, "/"), "GET").body();

        assertThat(body).doesNotContain("<script", "<img");
        PageDocument page = PageDocument.parse(body);
        assertThat(page.elements("script", null)).isEmpty();
        assertThat(page.elements("img", null)).isEmpty();
        Element chart = page.elements("svg", "lot-chart").get(0);
        assertThat(chart.getAttribute("data-lot")).isEqualTo(hostile);
        assertThat(chart.getAttribute("data-product")).isEqualTo("p&q");
        assertThat(chart.getAttribute("id")).matches("[A-Za-z0-9._-]+");
        assertThat(page.text()).contains(hostile, hostileClosed);
        Element closed = PageDocument.elementsIn(page.byId("closed-lots"), "svg", "closed-lot").get(0);
        assertThat(closed.getAttribute("data-lot")).isEqualTo(hostileClosed);
        assertThat(closed.getAttribute("id")).matches("[A-Za-z0-9._-]+").isNotEqualTo(chart.getAttribute("id"));
        assertThat(page.elements("tr", "alert-row").get(0).getTextContent()).contains(hostile);
        assertThat(AlertKind.LOT.code()).isEqualTo("lot");
    }

    @Test
    void anEmptyViewGivesAPageThatSaysSo() throws Exception {
        PageDocument page = PageDocument.parse(get(serve(new FleetView(), "/"), "GET").body());
        assertThat(page.elements("svg", null)).isEmpty();
        assertThat(page.text()).contains("No open lot", "No lot closed recently", "No station", "No alert since", "No sweep fitted yet");
    }

    @Test
    void onlyGetOfTheMountPointGivesThePage() throws Exception {
        URI base = serve(new FleetView(), "/status");
        assertThat(get(base, "GET").statusCode()).isEqualTo(200);
        assertThat(get(base.resolve("/status/"), "GET").statusCode()).isEqualTo(200);
        HttpResponse<String> head = get(base, "HEAD");
        assertThat(head.statusCode()).isEqualTo(405);
        assertThat(head.headers().firstValue("Allow")).hasValue("GET");
        assertThat(get(base, "POST").statusCode()).isEqualTo(405);
        assertThat(get(base, "DELETE").statusCode()).isEqualTo(405);
        assertThat(get(base.resolve("/status/metrics"), "GET").statusCode()).isEqualTo(404);
        assertThat(get(base.resolve("/status/index.html"), "GET").statusCode()).isEqualTo(404);
        assertThat(StatusPage.isPage("/", "/")).isTrue();
        assertThat(StatusPage.isPage("/", "/x")).isFalse();
    }

    /**
     * Three lots of the drift tests' plant through both monitors (a normal one, one measured after
     * st-03's connector worked loose, then one 4 % low while the connector is still loose; a quiet
     * period long enough that only the units of the lot after it close a lot, so the low lot stays
     * open and the other two are recently closed), and one fitted sweep of the demo plant.
     */
    static FleetView plantView() throws Exception {
        FleetView view = new FleetView();
        PlantFeed feed = new PlantFeed(PlantValues.settings().withQuietPeriod(Duration.ofDays(1)), view);
        PlantValues plant = new PlantValues(21, 4);
        feed.measurements(plant.lot("L1", 150, 1.0));
        feed.measurements(plant.lot("L3", 100, 1.0, LOOSE_STATION, PlantValues.Fault.LOOSE_CONNECTOR));
        feed.measurements(plant.lot(LOW_LOT, 120, 0.96, LOOSE_STATION, PlantValues.Fault.LOOSE_CONNECTOR));
        Sweep sweep = new DemoPlant(3, Clock.fixed(Instant.parse("2026-03-02T08:00:00Z"), ZoneOffset.UTC)).next().sweep();
        ResonanceResult result = new ResonanceAnalyzer().analyze(sweep);
        view.sweepFitted(sweep, result, ProductCatalogue.demoPlant().judge(sweep.info().product(), sweep.topology(), result), 0);
        return view;
    }

    private URI serve(FleetView view, String mount) throws Exception {
        server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 0);
        server.createContext(mount, new StatusPage(view));
        server.start();
        return URI.create("http://127.0.0.1:" + server.getAddress().getPort() + mount);
    }

    private HttpResponse<String> get(URI uri, String method) throws Exception {
        HttpRequest request = HttpRequest.newBuilder(uri).method(method, HttpRequest.BodyPublishers.noBody()).build();
        return client.send(request, HttpResponse.BodyHandlers.ofString());
    }
}
