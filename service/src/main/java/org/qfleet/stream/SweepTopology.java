package org.qfleet.stream;

import org.apache.kafka.common.serialization.ByteArrayDeserializer;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.apache.kafka.streams.StreamsBuilder;
import org.apache.kafka.streams.StreamsConfig;
import org.apache.kafka.streams.Topology;
import org.apache.kafka.streams.TopologyConfig;
import org.qfleet.drift.DriftSettings;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The service's Kafka Streams topology: sweeps in, through {@link SweepProcessor}, to results and
 * rejects (stateless, so scale-out is more partitions and more instances); results on to the drift
 * monitors and alerts ({@link DriftTopology}).
 */
public final class SweepTopology {

    static final String SOURCE = "sweeps";
    static final String PROCESSOR = "fit";
    static final String RESULTS_SINK = "results";
    static final String REJECTS_SINK = "rejects";

    private SweepTopology() {
    }

    public static Topology build(StreamSettings settings, ProductCatalogue catalogue) {
        return build(settings, catalogue, DriftSettings.DEFAULT);
    }

    /** The whole topology: fitting (stateless) and drift monitoring ({@link DriftTopology}). */
    public static Topology build(StreamSettings settings, ProductCatalogue catalogue, DriftSettings drift) {
        return build(settings, catalogue, drift, ServiceObserver.NONE);
    }

    /** The whole topology, reporting what it does to {@code observer}. */
    public static Topology build(StreamSettings settings, ProductCatalogue catalogue, DriftSettings drift,
            ServiceObserver observer) {
        SweepHandler handler = new SweepHandler(settings, catalogue, observer);
        RejectJson rejects = new RejectJson(settings.maxRejectPayloadBytes());
        StreamsBuilder builder = new StreamsBuilder(new TopologyConfig(new StreamsConfig(settings.streamsProperties())));
        DriftTopology.add(builder, settings.topics(), DriftTopology.withCatalogue(drift, catalogue), observer);
        Topology topology = builder.build();
        topology.addSource(SOURCE, new ByteArrayDeserializer(), new ByteArrayDeserializer(), settings.topics().sweeps());
        topology.addProcessor(PROCESSOR, () -> new SweepProcessor(handler, rejects, observer), SOURCE);
        topology.addSink(RESULTS_SINK, settings.topics().results(), new ByteArraySerializer(), new ByteArraySerializer(), PROCESSOR);
        topology.addSink(REJECTS_SINK, settings.topics().rejects(), new ByteArraySerializer(), new ByteArraySerializer(), PROCESSOR);
        return topology;
    }
}
