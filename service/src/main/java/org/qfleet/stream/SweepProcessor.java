package org.qfleet.stream;

import org.apache.kafka.streams.processor.api.ContextualProcessor;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.processor.api.RecordMetadata;

/**
 * The topology's one processor: each sweep record gives exactly one record downstream, a result
 * to the results sink or a reject, with the record's topic, partition and offset, to the rejects
 * sink. Keys and timestamps are kept.
 */
final class SweepProcessor extends ContextualProcessor<byte[], byte[], byte[], byte[]> {

    private final SweepHandler handler;
    private final RejectJson rejects;
    private final ServiceObserver observer;

    SweepProcessor(SweepHandler handler, RejectJson rejects, ServiceObserver observer) {
        this.handler = handler;
        this.rejects = rejects;
        this.observer = observer;
    }

    @Override
    public void process(Record<byte[], byte[]> record) {
        RecordMetadata at = context().recordMetadata().orElse(null);
        String topic = at == null ? "unknown" : at.topic();
        int partition = at == null ? -1 : at.partition();
        long offset = at == null ? -1 : at.offset();
        SweepOutcome outcome = handler.handle(topic + "/" + partition + "@" + offset, record.value());
        if (outcome instanceof SweepOutcome.Fitted fitted) {
            context().forward(record.withValue(fitted.json()), SweepTopology.RESULTS_SINK);
        } else if (outcome instanceof SweepOutcome.Failed failed) {
            Reject reject = new Reject(failed.code(), failed.message(), failed.sweepId(), topic, partition, offset,
                    record.key(), record.value());
            context().forward(record.withValue(rejects.write(reject)), SweepTopology.REJECTS_SINK);
            observer.sweepRejected(failed.code());
        }
    }
}
