package org.qfleet.sim;

/** One test station of the demo plant: the product it tests and its fixture's own impairments. */
record DemoStation(String id, String fixtureId, DemoProduct product, double snrDb, Impairments fixture) {
}
