package org.qfleet.app.http;

/**
 * Whether the service processes its input now.
 *
 * @param ready  true while it does
 * @param state  what it is doing, in one short line (e.g. the Kafka Streams state)
 */
public record Readiness(boolean ready, String state) {
}
