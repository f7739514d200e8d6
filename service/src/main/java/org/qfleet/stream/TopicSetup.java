package org.qfleet.stream;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.NewTopic;
import org.apache.kafka.clients.admin.TopicDescription;
import org.apache.kafka.common.errors.TopicExistsException;
import org.apache.kafka.common.errors.UnknownTopicOrPartitionException;

/**
 * Checks that the service's topics exist and creates the missing ones when asked to.
 *
 * @param partitionsOf partitions of each topic to create, by topic name; topics not listed get
 *                     {@code defaultPartitions}
 */
public record TopicSetup(Map<String, Integer> partitionsOf, int defaultPartitions, Optional<Short> replicationFactor) {

    private static final long LEADER_POLL_MILLIS = 50;

    public TopicSetup {
        partitionsOf = Map.copyOf(partitionsOf);
        if (defaultPartitions < 1) {
            throw new IllegalArgumentException("partitions must be at least 1, got " + defaultPartitions);
        }
    }

    /** The names among {@code wanted} that the cluster does not have. */
    public static List<String> missing(Admin admin, List<String> wanted, Duration timeout)
            throws InterruptedException, ExecutionException, TimeoutException {
        Set<String> existing = admin.listTopics().names().get(timeout.toMillis(), TimeUnit.MILLISECONDS);
        List<String> missing = new ArrayList<>();
        for (String topic : wanted) {
            if (!existing.contains(topic)) {
                missing.add(topic);
            }
        }
        return missing;
    }

    /** Creates the topics among {@code wanted} that do not exist yet; returns those it created. */
    public List<String> createMissing(Admin admin, List<String> wanted, Duration timeout)
            throws InterruptedException, ExecutionException, TimeoutException {
        List<String> missing = missing(admin, wanted, timeout);
        List<NewTopic> topics = new ArrayList<>();
        for (String name : missing) {
            topics.add(new NewTopic(name, Optional.of(partitionsOf.getOrDefault(name, defaultPartitions)), replicationFactor));
        }
        if (topics.isEmpty()) {
            return List.of();
        }
        long deadline = System.nanoTime() + timeout.toNanos();
        try {
            admin.createTopics(topics).all().get(timeout.toMillis(), TimeUnit.MILLISECONDS);
        } catch (ExecutionException e) {
            if (!(e.getCause() instanceof TopicExistsException)) {
                throw e;
            }
        }
        awaitLeaders(admin, missing, deadline);
        return missing;
    }

    /**
     * Waits until every partition of the new topics has a leader. A producer that writes to a
     * partition the broker has not taken up yet gets its first request refused; with several
     * requests in flight a later one can then be written first, and the refused one is retried
     * until it expires (Apache Kafka issue KAFKA-15591: an idempotent producer loses those records).
     */
    private static void awaitLeaders(Admin admin, List<String> topics, long deadline)
            throws InterruptedException, ExecutionException, TimeoutException {
        while (true) {
            long left = deadline - System.nanoTime();
            if (left <= 0) {
                throw new TimeoutException("the new topics " + topics + " have no leader yet");
            }
            Map<String, TopicDescription> described;
            try {
                described = admin.describeTopics(topics).allTopicNames().get(left, TimeUnit.NANOSECONDS);
            } catch (ExecutionException e) {
                if (!(e.getCause() instanceof UnknownTopicOrPartitionException)) {
                    throw e;
                }
                described = Map.of();
            }
            if (described.size() == topics.size() && described.values().stream()
                    .allMatch(d -> d.partitions().stream().allMatch(p -> p.leader() != null && !p.leader().isEmpty()))) {
                return;
            }
            Thread.sleep(LEADER_POLL_MILLIS);
        }
    }
}
