package org.qfleet.stream;

import java.util.List;
import java.util.Map;
import org.apache.kafka.streams.errors.ErrorHandlerContext;
import org.apache.kafka.streams.errors.ProcessingExceptionHandler;
import org.apache.kafka.streams.processor.api.Record;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Last line of defence: an exception that escapes the processor (it catches everything it knows
 * of) becomes an {@code internal-error} reject of the record, and the stream goes on.
 */
public final class UnexpectedFailureHandler implements ProcessingExceptionHandler {

    private static final Logger LOG = LoggerFactory.getLogger(UnexpectedFailureHandler.class);

    private RejectRecords rejects;

    @Override
    public void configure(Map<String, ?> configs) {
        rejects = RejectRecords.configured(configs);
    }

    @Override
    public Response handleError(ErrorHandlerContext context, Record<?, ?> record, Exception exception) {
        LOG.warn("internal error on {}/{}@{}: {}", context.topic(), context.partition(), context.offset(), exception.toString());
        return Response.resume(List.of(rejects.reject(context, RejectCodes.INTERNAL_ERROR,
                "internal error, " + exception.getClass().getSimpleName()
                        + (exception.getMessage() == null ? "" : ": " + exception.getMessage()))));
    }
}
