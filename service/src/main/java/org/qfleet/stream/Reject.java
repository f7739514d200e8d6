package org.qfleet.stream;

/**
 * Why one input record could not be processed, and where it came from.
 *
 * @param code      stable reason code, one of {@link RejectCodes#all()}
 * @param message   what is wrong and where, for people
 * @param sweepId   the sweep's id when it could be read, else null
 * @param topic     source topic
 * @param partition source partition
 * @param offset    source offset
 * @param key       the record's key, or null
 * @param payload   the record's value as received, or null
 */
public record Reject(String code, String message, String sweepId, String topic, int partition, long offset,
        byte[] key, byte[] payload) {
}
