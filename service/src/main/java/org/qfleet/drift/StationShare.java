package org.qfleet.drift;

/** The units of one lot measured on one station: Qu, f0 and coupling level statistics. */
public record StationShare(Welford qu, Welford f0, Welford level) {

    public static final StationShare EMPTY = new StationShare(Welford.EMPTY, Welford.EMPTY, Welford.EMPTY);

    StationShare plus(UnitValue v) {
        return new StationShare(qu.plus(v.qUnloaded()), f0.plus(v.f0Hz()),
                Double.isFinite(v.levelDb()) ? level.plus(v.levelDb()) : level);
    }

    StationShare minus(UnitValue v) {
        return new StationShare(qu.minus(v.qUnloaded()), f0.minus(v.f0Hz()),
                Double.isFinite(v.levelDb()) ? level.minus(v.levelDb()) : level);
    }

    StationShare combine(StationShare o) {
        return new StationShare(qu.combine(o.qu), f0.combine(o.f0), level.combine(o.level));
    }
}
