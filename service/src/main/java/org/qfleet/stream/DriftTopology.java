package org.qfleet.stream;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.streams.KeyValue;
import org.apache.kafka.streams.StreamsBuilder;
import org.apache.kafka.streams.kstream.Consumed;
import org.apache.kafka.streams.kstream.KStream;
import org.apache.kafka.streams.kstream.Produced;
import org.apache.kafka.streams.kstream.Repartitioned;
import org.apache.kafka.streams.state.KeyValueStore;
import org.apache.kafka.streams.state.StoreBuilder;
import org.apache.kafka.streams.state.Stores;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.DriftSettings;
import org.qfleet.drift.LotMonitor;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.StationMonitor;
import org.qfleet.verdict.ProductCatalogue;
import org.qfleet.verdict.ProductLimits;

/**
 * The drift part of the topology: results are read back from the results topic, repartitioned by
 * product to the lot stage (product baseline and the product's lots: the baseline is learned from
 * units of all lots and stations, so it lives with them), whose station inputs are repartitioned
 * by station to the station stage (charts per product and station, one alert state per station). Both stages keep their state in persistent key-value
 * stores with changelog topics, under the service's exactly-once processing, so a restart resumes
 * with the same statistics and alert states. Alerts go to the alerts topic keyed by alert key.
 */
final class DriftTopology {

    static final String PRODUCTS_STORE = "drift-products";
    static final String LOTS_STORE = "drift-lots";
    static final String UNITS_STORE = "drift-units";
    static final String STATIONS_STORE = "drift-stations";
    static final String STATION_ALERTS_STORE = "drift-station-alerts";

    private DriftTopology() {
    }

    /**
     * The lot limit of each product is the catalogue's lower limit on Qu; baselines configured in
     * the catalogue are used from the first unit (settings given in code take precedence).
     */
    static DriftSettings withCatalogue(DriftSettings drift, ProductCatalogue catalogue) {
        Map<String, Double> limits = new java.util.HashMap<>(drift.lotLimits());
        for (ProductLimits l : catalogue.all()) {
            if (l.qUnloadedMin() != null) {
                limits.putIfAbsent(l.product(), l.qUnloadedMin());
            }
        }
        Map<String, Baseline> baselines = new java.util.HashMap<>(drift.baselines());
        catalogue.baselines().forEach((product, b) -> baselines.putIfAbsent(product, new Baseline(product, b.quMean(), b.quSigma(),
                orNaN(b.f0MeanHz()), orNaN(b.f0SigmaHz()), orNaN(b.insertionLossMeanDb()), orNaN(b.insertionLossSigmaDb()),
                Double.NaN, Baseline.CONFIGURED, 0)));
        return drift.withLotLimits(limits).withBaselines(baselines);
    }

    private static double orNaN(Double value) {
        return value == null ? Double.NaN : value;
    }

    /**
     * A persistent store with a changelog, cached: a key written for every unit (a product's state,
     * a busy lot's, a station's) reaches RocksDB and the changelog once per commit, not once per
     * unit; under exactly-once the cache is flushed inside the transaction.
     */
    private static StoreBuilder<KeyValueStore<String, byte[]>> store(String name) {
        return Stores.keyValueStoreBuilder(Stores.persistentKeyValueStore(name), Serdes.String(), Serdes.ByteArray())
                .withCachingEnabled();
    }

    static void add(StreamsBuilder builder, Topics topics, DriftSettings drift, ServiceObserver observer) {
        LotMonitor lotMonitor = new LotMonitor(drift);
        StationMonitor stationMonitor = new StationMonitor(drift);
        builder.addStateStore(store(PRODUCTS_STORE));
        builder.addStateStore(store(LOTS_STORE));
        builder.addStateStore(store(UNITS_STORE));
        builder.addStateStore(store(STATIONS_STORE));
        builder.addStateStore(store(STATION_ALERTS_STORE));
        KStream<String, byte[]> lotOut = builder.stream(topics.results(), Consumed.with(Serdes.ByteArray(), Serdes.ByteArray()))
                .flatMap((key, value) -> {
                    Optional<Measurement> m = value == null ? Optional.empty() : DriftJson.measurement(value);
                    return m.map(x -> List.of(KeyValue.pair(x.product(), DriftJson.write(x)))).orElse(List.of());
                })
                .repartition(Repartitioned.with(Serdes.String(), Serdes.ByteArray()).withName("drift-by-product"))
                .process(() -> new LotStageProcessor(lotMonitor, observer), PRODUCTS_STORE, LOTS_STORE, UNITS_STORE);
        lotOut.filter((k, v) -> DriftRecords.isAlert(v)).mapValues(DriftRecords::untagged)
                .to(topics.alerts(), Produced.with(Serdes.String(), Serdes.ByteArray()));
        lotOut.filter((k, v) -> DriftRecords.isStationInput(v)).mapValues(DriftRecords::untagged)
                .repartition(Repartitioned.with(Serdes.String(), Serdes.ByteArray()).withName("drift-by-station"))
                .process(() -> new StationStageProcessor(stationMonitor, observer), STATIONS_STORE, STATION_ALERTS_STORE)
                .to(topics.alerts(), Produced.with(Serdes.String(), Serdes.ByteArray()));
    }
}
