package org.qfleet.app.plot;

/** How measured points are drawn: small dots, thinned out so that huge sweeps stay light files. */
final class DataDots {

    static final double RADIUS = 1.8;
    /** Most dots drawn per panel; longer sweeps show every n-th point. */
    static final int MAX_DOTS = 2000;

    private DataDots() {
    }

    static int stride(int points) {
        return Math.max(1, (points + MAX_DOTS - 1) / MAX_DOTS);
    }
}
