package org.qfleet.app;

/** Entry point of the shaded jar; the commands live in their own classes. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.out.println("qfleet");
    }
}
