package org.qfleet.app.plot;

/** Where a panel's plotting area sits in the drawing, in pixels. */
record PanelBox(double left, double top, double width, double height) {
}
