package org.qfleet.sim;

/** An open lot of the demo plant: how many units it has, how many are tested, and its Qu factor. */
final class DemoLot {

    private final String id;
    private final int size;
    private final double quFactor;
    private int tested;

    DemoLot(String id, int size, double quFactor) {
        this.id = id;
        this.size = size;
        this.quFactor = quFactor;
    }

    String id() {
        return id;
    }

    double quFactor() {
        return quFactor;
    }

    /** The next unit's number, from 1. */
    int nextUnit() {
        return ++tested;
    }

    boolean isComplete() {
        return tested >= size;
    }
}
