package org.meridian.ui;

import java.awt.Dimension;
import java.awt.Point;
import java.util.function.Supplier;
import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;

/**
 * The window on the demo study, as the GUI test classes share it: opened once per class (opening
 * is the slow part) at a fixed size in the light theme, with AssertJ Swing's check that every
 * Swing access happens on the event thread. Needs a display (see {@link DisplayRequirement}).
 */
final class DemoWindow {
    final Robot robot;
    final FrameFixture window;
    final MainWindow frame;
    private final Timeout wait;

    private DemoWindow(Robot robot, FrameFixture window, MainWindow frame, Timeout wait) {
        this.robot = robot;
        this.window = window;
        this.frame = frame;
        this.wait = wait;
    }

    /** Opens the demo study with the given view and waits until it is open. */
    static DemoWindow open(ViewOptions view, Timeout wait) {
        DisplayRequirement.check();
        FailOnThreadViolationRepaintManager.install();
        Robot robot = BasicRobot.robotWithNewAwtHierarchy();
        MainWindow frame = GuiActionRunner.execute(() -> {
            Theme.LIGHT.install();
            return new MainWindow(UiPrefs.inMemory());
        });
        FrameFixture window = new FrameFixture(robot, frame);
        window.show(new Dimension(1400, 900));
        window.moveTo(new Point(0, 0));
        DemoWindow demo = new DemoWindow(robot, window, frame, wait);
        GuiActionRunner.execute(() -> frame.openDemo(view));
        demo.waitFor("the demo study to open", () -> frame.workbench().model().session() != null
                && !frame.workbench().tasks().isRunning("open"));
        return demo;
    }

    /** Closes a window opened by {@link #open}; does nothing for null (the display was missing). */
    static void close(DemoWindow demo) {
        if (demo != null) {
            demo.window.cleanUp();
        }
    }

    ViewState state() {
        return frame.workbench().state();
    }

    /** Reads something on the event thread. */
    <T> T read(Supplier<T> s) {
        return GuiActionRunner.execute(s::get);
    }

    /** Waits until the condition, tested on the event thread, holds. */
    void waitFor(String what, Supplier<Boolean> c) {
        Pause.pause(new Condition(what) {
            @Override
            public boolean test() {
                return GuiActionRunner.execute(c::get);
            }
        }, wait);
    }

    /** Waits until no background task runs. */
    void settle() {
        waitFor("background work to finish", () -> frame.workbench().tasks().shown() == null
                && !frame.workbench().tasks().isRunning("averages") && !frame.workbench().tasks().isRunning("measures")
                && !frame.workbench().tasks().isRunning("span"));
        robot.waitForIdle();
    }
}
