package org.meridian.ui;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;

/**
 * Window tests need a display. On a developer's machine without one they are skipped; where the
 * environment variable {@code MERIDIAN_REQUIRE_DISPLAY} is set (CI sets it in {@code .ci/run},
 * which provides a virtual display) a missing display fails them instead, so they can never be
 * skipped there unnoticed.
 */
final class DisplayRequirement {
    private DisplayRequirement() {
    }

    static void check() {
        boolean headless = GraphicsEnvironment.isHeadless();
        if (headless && System.getenv("MERIDIAN_REQUIRE_DISPLAY") != null) {
            fail("MERIDIAN_REQUIRE_DISPLAY is set but there is no display for the window tests");
        }
        assumeFalse(headless, "needs a display (run under xvfb-run, as .ci/run does)");
    }
}
