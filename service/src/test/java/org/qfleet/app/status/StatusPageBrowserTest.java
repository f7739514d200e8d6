package org.qfleet.app.status;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.sun.net.httpserver.HttpServer;
import java.awt.image.BufferedImage;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.HashSet;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.StationFault;

/**
 * The status page in a real browser: the demo plant's sweeps (a tired plating bath makes a cavity
 * lot lose 4 % of its Qu, and station st-03's connector works loose) are fitted and run through
 * both drift monitors in memory until both alerts were raised and the tired lot has closed (as it
 * soon does in the demo), the view they feed is served on a local port, and headless
 * Chromium takes a screenshot ({@code target/status-page.png}) and dumps the DOM it built
 * ({@code target/status-page-dom.html}).
 * Skipped when no Chromium is installed.
 */
@Tag("browser")
class StatusPageBrowserTest {

    private static final String TIRED_PRODUCT = "cav-x104";
    private static final String LOOSE_STATION = "st-03";
    private static final int FAULT_AFTER_SWEEPS = 600;
    private static final int MAX_SWEEPS = 3000;
    private static final Path SCREENSHOT = Path.of("target", "status-page.png");
    private static final Path DOM = Path.of("target", "status-page-dom.html");

    @TempDir
    Path work;

    @Test
    void chromiumShowsTheDriftingLotAfterItClosedTheFaultyStationAndTheLastFit() throws Exception {
        Optional<Path> chromium = HeadlessChromium.find();
        assumeTrue(chromium.isPresent(), "no chromium binary on the PATH (or in QFLEET_CHROMIUM)");

        FleetView view = new FleetView();
        PlantFeed feed = new PlantFeed(PlantFeed.demoPlantSettings(), view);
        Instant start = Instant.parse("2026-03-02T06:00:00Z");
        DemoPlant plant = new DemoPlant(1, Clock.fixed(start, ZoneOffset.UTC));
        Instant faultTime = start.plusSeconds(FAULT_AFTER_SWEEPS);
        String tiredLot = null;
        for (int i = 0; i < MAX_SWEEPS && !(bothRaised(feed, tiredLot, faultTime) && closed(view, tiredLot)); i++) {
            if (i == FAULT_AFTER_SWEEPS) {
                plant.loosenConnector(LOOSE_STATION, StationFault.LOOSE_CONNECTOR);
            }
            feed.sweep(plant.next(start.plusSeconds(i)).sweep());
            if (i == 0) {
                tiredLot = plant.degradeNextLot(TIRED_PRODUCT, 0.04);
            }
        }
        assertThat(bothRaised(feed, tiredLot, faultTime)).as("the monitors raised both alerts of the demo").isTrue();
        assertThat(closed(view, tiredLot)).as("the tired lot closed").isTrue();
        FleetSnapshot snapshot = view.snapshot();

        HttpServer server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 0);
        server.createContext("/", new StatusPage(view));
        server.start();
        try {
            String url = "http://127.0.0.1:" + server.getAddress().getPort() + "/";
            HeadlessChromium browser = HeadlessChromium.at(chromium.get(), work);
            Files.createDirectories(SCREENSHOT.getParent());
            Files.deleteIfExists(SCREENSHOT);
            browser.screenshot(url, SCREENSHOT, 1400, 2400);
            String dom = browser.dumpDom(url);
            Files.writeString(DOM, dom);

            assertThat(count(dom, "<svg[^>]* class=\"lot-chart")).isEqualTo(snapshot.lots().size() + snapshot.closedLots().size())
                    .isGreaterThan(snapshot.closedLots().size());
            assertThat(count(dom, "<svg[^>]* class=\"lot-chart closed-lot")).isEqualTo(snapshot.closedLots().size());
            assertThat(count(dom, "<svg[^>]* class=\"station-chart")).isEqualTo(snapshot.stations().size()).isEqualTo(8);
            assertThat(dom).as("the tired lot, closed after its alert, and the loose station, alerted now").contains(
                    "id=\"lot-chart-" + TIRED_PRODUCT + "-" + tiredLot + "\" class=\"lot-chart closed-lot alerted\"",
                    "id=\"station-chart-" + TIRED_PRODUCT + "-" + LOOSE_STATION + "\" class=\"station-chart alerted\"");
            String closedSection = between(dom, "<section id=\"closed-lots\"", "</section>");
            Matcher firstClosed = Pattern.compile("<svg[^>]*>").matcher(closedSection);
            assertThat(firstClosed.find()).isTrue();
            assertThat(firstClosed.group()).as("the tired lot's chart comes first among the closed lots")
                    .contains("id=\"lot-chart-" + TIRED_PRODUCT + "-" + tiredLot + "\"");
            assertThat(closedSection).contains("closed ", "alerted while open", "lot-mean-below-xbar-limit");
            String table = between(dom, "<table id=\"alert-table\"", "</table>");
            assertThat(table).contains(tiredLot, LOOSE_STATION, "lot-mean-below-xbar-limit");
            assertThat(dom).containsPattern("<svg[^>]* id=\"fit-plot\"");
            assertThat(between(dom, "id=\"fit-plot\"", "</svg>")).contains("class=\"fit\"");

            assertThat(SCREENSHOT).exists();
            assertThat(Files.size(SCREENSHOT)).as("a screenshot with content").isGreaterThan(50_000);
            BufferedImage image = ImageIO.read(SCREENSHOT.toFile());
            assertThat(image.getWidth()).isEqualTo(1400);
            assertThat(image.getHeight()).isEqualTo(2400);
            assertThat(colours(image)).as("colours in the screenshot: charts, not a blank page").isGreaterThan(20);
        } finally {
            server.stop(0);
        }
    }

    /**
     * Whether the tired lot's alert is raised and the loose station's alert was raised or updated
     * by a unit measured after the fault began (the demo's stations can signal before it, too).
     */
    private static boolean bothRaised(PlantFeed feed, String lot, Instant faultTime) {
        boolean lotRaised = false;
        boolean stationRaised = false;
        for (Alert a : feed.alerts()) {
            if (a.status() == AlertStatus.RAISED) {
                lotRaised |= a.kind() == AlertKind.LOT && a.subject().equals(lot);
                stationRaised |= a.kind() == AlertKind.STATION && a.subject().equals(LOOSE_STATION)
                        && a.eventTime() >= faultTime.toEpochMilli();
            }
        }
        return lotRaised && stationRaised;
    }

    private static boolean closed(FleetView view, String lot) {
        return lot != null && view.snapshot().closedLots().stream().anyMatch(l -> l.lot().equals(lot));
    }

    private static int count(String text, String regex) {
        Matcher m = Pattern.compile(regex).matcher(text);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    private static String between(String text, String from, String to) {
        int start = text.indexOf(from);
        assertThat(start).as("%s in the page", from).isNotNegative();
        int end = text.indexOf(to, start);
        return text.substring(start, end < 0 ? text.length() : end);
    }

    private static int colours(BufferedImage image) {
        Set<Integer> seen = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 3) {
            for (int x = 0; x < image.getWidth(); x += 3) {
                seen.add(image.getRGB(x, y));
            }
        }
        return seen.size();
    }
}
