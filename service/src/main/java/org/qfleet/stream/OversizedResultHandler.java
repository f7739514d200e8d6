package org.qfleet.stream;

import java.util.List;
import java.util.Map;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.errors.RecordTooLargeException;
import org.apache.kafka.streams.errors.ErrorHandlerContext;
import org.apache.kafka.streams.errors.ProductionExceptionHandler;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * A result too large for the broker becomes an {@code oversized} reject of the sweep it came from,
 * and the stream goes on; any other failure to produce stops the stream thread as Kafka Streams
 * does by default (those are failures of the cluster or the configuration, not of one input).
 */
public final class OversizedResultHandler implements ProductionExceptionHandler {

    private static final Logger LOG = LoggerFactory.getLogger(OversizedResultHandler.class);

    private RejectRecords rejects;

    @Override
    public void configure(Map<String, ?> configs) {
        rejects = RejectRecords.configured(configs);
    }

    @Override
    public Response handleError(ErrorHandlerContext context, ProducerRecord<byte[], byte[]> record, Exception exception) {
        if (exception instanceof RecordTooLargeException) {
            LOG.warn("a record for {} from {}/{}@{} is too large for the broker; rejected as oversized",
                    record.topic(), context.topic(), context.partition(), context.offset());
            return Response.resume(List.of(rejects.reject(context, RejectCodes.OVERSIZED,
                    "the output for this message is too large for the broker: " + exception.getMessage())));
        }
        return Response.fail();
    }

    @Override
    public Response handleSerializationError(ErrorHandlerContext context, ProducerRecord record, Exception exception,
            SerializationExceptionOrigin origin) {
        return Response.fail();
    }
}
