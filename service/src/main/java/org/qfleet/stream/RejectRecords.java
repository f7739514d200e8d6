package org.qfleet.stream;

import java.util.Map;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.streams.errors.ErrorHandlerContext;

/** Builds reject records from inside Kafka Streams' exception handlers, which know the source record. */
final class RejectRecords {

    private final String topic;
    private final RejectJson json;

    private RejectRecords(String topic, RejectJson json) {
        this.topic = topic;
        this.json = json;
    }

    /** From the handler's configuration, which carries the Streams settings. */
    static RejectRecords configured(Map<String, ?> configs) {
        Object topic = configs.get(StreamSettings.REJECTS_TOPIC_CONFIG);
        Object bound = configs.get(StreamSettings.REJECT_PAYLOAD_CONFIG);
        return new RejectRecords(topic == null ? Topics.DEFAULT.rejects() : topic.toString(),
                new RejectJson(bound == null ? StreamSettings.DEFAULT_MAX_REJECT_PAYLOAD_BYTES : Integer.parseInt(bound.toString())));
    }

    ProducerRecord<byte[], byte[]> reject(ErrorHandlerContext context, String code, String message) {
        Reject reject = new Reject(code, message, null, context.topic(), context.partition(), context.offset(),
                context.sourceRawKey(), context.sourceRawValue());
        return new ProducerRecord<>(topic, null, context.timestamp(), context.sourceRawKey(), json.write(reject));
    }
}
