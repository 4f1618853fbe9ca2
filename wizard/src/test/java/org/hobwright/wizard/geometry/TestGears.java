package org.hobwright.wizard.geometry;

/** Gears for tests, built from plain numbers. */
public final class TestGears {
    private TestGears() {
    }

    /** A gear of a built-in tooth system, no thickness allowance. */
    public static InvoluteGear gear(int z, double moduleMm, double alphaDeg, double betaDeg, double x, String system) {
        return new InvoluteGear(z, moduleMm, Math.toRadians(alphaDeg), Math.toRadians(betaDeg), x, 0,
                ToothSystem.builtIn(system).orElseThrow());
    }

    /** An ISO 53 A gear. */
    public static InvoluteGear gear(int z, double moduleMm, double alphaDeg, double betaDeg, double x) {
        return gear(z, moduleMm, alphaDeg, betaDeg, x, "iso53-a");
    }

    /** Asserts a relative agreement. */
    public static void assertRelative(double expected, double actual, double relative, String message) {
        double tol = relative * Math.max(Math.abs(expected), 1e-12);
        if (!(Math.abs(expected - actual) <= tol)) {
            throw new AssertionError(message + ": expected " + expected + " but was " + actual + " (relative "
                    + (actual - expected) / expected + ")");
        }
    }
}
