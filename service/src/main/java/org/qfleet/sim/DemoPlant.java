package org.qfleet.sim;

import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.SplittableRandom;
import org.qfleet.sweep.SweepInfo;

/**
 * The invented plant of the demo: two products ({@link DemoProduct#CAVITY_X104} on stations
 * st-01..st-04, {@link DemoProduct#COAX_S36} on st-05..st-08), lots of 200 to 400 units spread over
 * the product's stations, and weakly coupled transmission sweeps with 35 to 45 dB SNR and a small
 * residual delay, leakage and tilt per fixture. Stations take turns, one sweep per {@link #next()}.
 *
 * <p>Hooks for the streaming demo: {@link #degradeNextLot} (a tired plating bath: the next lot's Qu
 * is lower by a fraction) and {@link #loosenConnector} (a station fault). Ids carry a run tag taken
 * from the clock at construction, so two runs do not reuse sweep or lot ids. Deterministic for a
 * given seed, clock and call sequence; methods are synchronized so hooks may come from another thread.
 */
public final class DemoPlant {

    private static final int STATIONS_PER_PRODUCT = 4;
    private static final int MIN_LOT_SIZE = 200;
    private static final int MAX_LOT_SIZE = 400;

    private final SplittableRandom random;
    private final SweepSimulator simulator;
    private final Clock clock;
    private final String runTag;
    private final List<DemoStation> stations = new ArrayList<>();
    private final Map<String, DemoLot> openLots = new HashMap<>();
    private final Map<String, Integer> lotsOpened = new HashMap<>();
    private final Map<String, Double> pendingQuLoss = new HashMap<>();
    private final Map<String, StationFault> faults = new HashMap<>();
    private final int points;
    private long sequence;

    public DemoPlant(long seed, Clock clock) {
        this(seed, clock, 0);
    }

    /**
     * A plant whose stations sweep {@code points} points over each product's usual span (for
     * benchmarks at other sizes), or the product's own number when {@code points} is 0.
     */
    public DemoPlant(long seed, Clock clock, int points) {
        if (points != 0 && points < 2) {
            throw new IllegalArgumentException("points must be 0 (the product's own) or at least 2, got " + points);
        }
        this.points = points;
        this.random = new SplittableRandom(seed);
        this.simulator = new SweepSimulator(random.nextLong());
        this.clock = Objects.requireNonNull(clock, "clock");
        this.runTag = Long.toString(clock.instant().getEpochSecond(), 36);
        List<DemoProduct> products = products();
        for (int p = 0; p < products.size(); p++) {
            for (int s = 1; s <= STATIONS_PER_PRODUCT; s++) {
                stations.add(newStation(p * STATIONS_PER_PRODUCT + s, products.get(p)));
            }
        }
    }

    public static List<DemoProduct> products() {
        return List.of(DemoProduct.CAVITY_X104, DemoProduct.COAX_S36);
    }

    public List<String> stationIds() {
        return stations.stream().map(DemoStation::id).toList();
    }

    /** The product a station tests. */
    public DemoProduct productOf(String stationId) {
        return station(stationId).product();
    }

    /** The next sweep, measured now by the plant's clock. */
    public SimulatedSweep next() {
        return next(clock.instant());
    }

    /** The next sweep, stamped with {@code measuredAt}. */
    public synchronized SimulatedSweep next(Instant measuredAt) {
        DemoStation station = stations.get((int) (sequence % stations.size()));
        DemoProduct product = station.product();
        DemoLot lot = openLots.computeIfAbsent(product.id(), id -> openLot(product));
        int unit = lot.nextUnit();
        if (lot.isComplete()) {
            openLots.remove(product.id());
        }
        StationFault fault = faults.get(station.id());
        SweepInfo info = new SweepInfo(
                String.format(Locale.ROOT, "sim-%s-%08d", runTag, sequence++),
                station.id(),
                product.id(),
                lot.id(),
                String.format(Locale.ROOT, "%s-%04d", lot.id(), unit),
                measuredAt.truncatedTo(ChronoUnit.MILLIS).toString(),
                station.fixtureId(),
                Math.round((23 + 0.3 * random.nextGaussian()) * 10) / 10.0);
        ResonatorCircuit circuit = unitCircuit(product, lot.quFactor(), fault);
        double snrDb = station.snrDb() + random.nextDouble(-1, 1) - (fault == null ? 0 : fault.snrLossDb());
        SweepPlan plan = points == 0 ? product.sweepPlan() : SweepPlan.centred(product.f0Hz(), product.spanHz(), points);
        return simulator.simulate(circuit, plan, station.fixture().withSnrDb(snrDb), info);
    }

    /**
     * Makes the product's next lot come from a tired plating bath: every unit's Qu is lower by
     * {@code quLossFraction} (for example 0.04). Returns the id that lot will carry.
     */
    public synchronized String degradeNextLot(String productId, double quLossFraction) {
        DemoProduct product = product(productId);
        if (!(quLossFraction > 0 && quLossFraction < 1)) {
            throw new IllegalArgumentException("quLossFraction must lie between 0 and 1, got " + quLossFraction);
        }
        pendingQuLoss.put(product.id(), quLossFraction);
        return lotId(product, lotsOpened.getOrDefault(product.id(), 0) + 1);
    }

    /** Starts a fault on a station; it lasts until {@link #repairStation}. */
    public synchronized void loosenConnector(String stationId, StationFault fault) {
        faults.put(station(stationId).id(), Objects.requireNonNull(fault, "fault"));
    }

    public synchronized void repairStation(String stationId) {
        faults.remove(station(stationId).id());
    }

    private ResonatorCircuit unitCircuit(DemoProduct product, double quFactor, StationFault fault) {
        double f0 = product.f0Hz() + product.f0SigmaHz() * truncatedGaussian();
        double qu = product.qUnloaded() * (1 + product.qUnloadedSigmaFraction() * truncatedGaussian()) * quFactor;
        double lossDb = product.insertionLossDb() + product.insertionLossSigmaDb() * truncatedGaussian();
        double ratio = Math.exp(product.couplingRatioSigma() * truncatedGaussian());
        ResonatorCircuit unit = ResonatorCircuit.transmissionWithInsertionLoss(f0, qu, lossDb, ratio);
        if (fault == null) {
            return unit;
        }
        return ResonatorCircuit.transmission(f0 * (1 + fault.f0ShiftPpm() * 1e-6), qu,
                unit.coupling1() * fault.couplingScale(), unit.coupling2() * fault.couplingScale());
    }

    private DemoLot openLot(DemoProduct product) {
        int number = lotsOpened.merge(product.id(), 1, Integer::sum);
        Double loss = pendingQuLoss.remove(product.id());
        int size = random.nextInt(MIN_LOT_SIZE, MAX_LOT_SIZE + 1);
        return new DemoLot(lotId(product, number), size, loss == null ? 1 : 1 - loss);
    }

    private String lotId(DemoProduct product, int number) {
        return String.format(Locale.ROOT, "%s-%s-%03d", product.lotCode(), runTag, number);
    }

    private DemoStation newStation(int number, DemoProduct product) {
        double leakage = Math.pow(10, random.nextDouble(-80, -70) / 20);
        double leakagePhase = random.nextDouble(0, 2 * Math.PI);
        Impairments fixture = new Impairments(Double.POSITIVE_INFINITY,
                random.nextDouble(20e-12, 150e-12),
                leakage * Math.cos(leakagePhase), leakage * Math.sin(leakagePhase),
                random.nextDouble(-0.1, 0.1), false);
        String id = String.format(Locale.ROOT, "st-%02d", number);
        return new DemoStation(id, "fx-" + id.substring(3) + "a", product, random.nextDouble(36, 44), fixture);
    }

    /** A standard normal draw cut off at three sigma, so no unit lands at a sweep edge. */
    private double truncatedGaussian() {
        double z;
        do {
            z = random.nextGaussian();
        } while (Math.abs(z) > 3);
        return z;
    }

    private DemoStation station(String stationId) {
        return stations.stream().filter(s -> s.id().equals(stationId)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("unknown station '" + stationId + "', expected one of " + stationIds()));
    }

    private static DemoProduct product(String productId) {
        return products().stream().filter(p -> p.id().equals(productId)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("unknown product '" + productId + "', expected one of "
                        + products().stream().map(DemoProduct::id).toList()));
    }
}
