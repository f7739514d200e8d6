package org.qfleet.drift;

/**
 * When an open lot was last seen, for closing it: the latest measuredAt of its units, and the
 * product's unit count at its latest unit.
 *
 * @param lastEventTime latest measuredAt of the lot's units, epoch milliseconds
 * @param lastUnit      the product's unit count when the lot's latest unit arrived
 */
public record OpenLot(long lastEventTime, long lastUnit) {
}
