package org.arcwright.app.gui;

import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Component;
import java.awt.Graphics2D;
import java.awt.GraphicsEnvironment;
import java.awt.event.KeyEvent;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import org.arcwright.app.shell.AppServices;
import org.arcwright.app.DesktopApp;
import org.arcwright.app.model.Settings;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.Robot;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.Assumptions;

/**
 * What every GUI test needs: a display (failing, not skipping, when CI expects one), the real window
 * over a test config folder, work on the event thread, and screenshots under {@code target/screenshots}.
 */
final class GuiSupport {
    private GuiSupport() {}

    /** The window under test, the robot that drives it and the fixture that finds its parts. */
    record OpenWindow(MainWindow window, Robot robot, FrameFixture fixture) {
        /** Releases the robot, then closes the notes index and lets background writes finish. */
        void close() {
            fixture.cleanUp();
            onEdt(() -> window.dispose());
        }
    }

    /** Starts the real window, in the light look, over the config folder {@code config}. */
    static OpenWindow openWindow(Path config) {
        requireDisplay();
        AppServices services = AppServices.over(config);
        MainWindow window = onEdt(() -> DesktopApp.start(services, Settings.DEFAULTS.withTheme(ThemeChoice.LIGHT)));
        Robot robot = BasicRobot.robotWithCurrentAwtHierarchy();
        return new OpenWindow(window, robot, new FrameFixture(robot, window.frame()));
    }

    /** Selects row {@code row} of the Part table and waits until the selection shows. */
    static void selectFeatureRow(FrameFixture fixture, int row) {
        var table = fixture.table("featureTable");
        table.selectRows(row);
        waitFor(() -> onEdt(() -> table.target().getSelectedRow()) == row, 10);
        settle(100);
    }

    /** The Check panel's verdict line. */
    static String checkVerdict(MainWindow window) {
        return onEdt(() -> window.checkPanel().verdictText());
    }

    /** Checks {@code file} for the selected feature and waits for a verdict or a refusal. */
    static void checkAndWait(MainWindow window, Path file) {
        onEdt(() -> window.checkPanel().check(file));
        // 60 s: a check took over 30 s at load 20
        waitFor(() -> checkVerdict(window).startsWith("The measured contour") || checkVerdict(window).startsWith("Not checked")
                || checkVerdict(window).startsWith("Cannot check"), 60);
    }

    /** Fails under CI without a display; skips on a developer machine without one. */
    static void requireDisplay() {
        if (!GraphicsEnvironment.isHeadless()) return;
        if (System.getenv("CI") != null) {
            fail("No display, but CI is set: GUI tests must run under a display. Use xvfb-run -a mvn -B verify.");
        }
        Assumptions.abort("no display on this machine; run under xvfb-run to include the GUI tests");
    }

    static <T> T onEdt(Callable<T> c) {
        AtomicReference<T> result = new AtomicReference<>();
        AtomicReference<Exception> error = new AtomicReference<>();
        try {
            SwingUtilities.invokeAndWait(() -> {
                try {
                    result.set(c.call());
                } catch (Exception e) {
                    error.set(e);
                }
            });
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
        if (error.get() != null) throw new IllegalStateException(error.get());
        return result.get();
    }

    static void onEdt(Runnable r) {
        onEdt(() -> {
            r.run();
            return null;
        });
    }

    /** Lets queued events, timers and background results settle. */
    static void settle(long millis) {
        try {
            Thread.sleep(millis);
            SwingUtilities.invokeAndWait(() -> { });
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    /** Waits until {@code condition} holds, failing the test after {@code seconds}. */
    static void waitFor(BooleanSupplier condition, int seconds) {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
        while (System.nanoTime() < end) {
            if (condition.getAsBoolean()) return;
            settle(100);
        }
        throw new AssertionError("condition not met within " + seconds + " s");
    }

    /** Presses Ctrl with {@code key}, as a user would. */
    static void chord(Robot robot, int key) {
        robot.pressKey(KeyEvent.VK_CONTROL);
        robot.pressAndReleaseKey(key);
        robot.releaseKey(KeyEvent.VK_CONTROL);
        robot.waitForIdle();
    }

    /** Paints {@code c} into {@code target/screenshots/name.png}. */
    static Path screenshot(Component c, String name) {
        Path dir = Path.of(System.getProperty("arcwright.screenshots", "target/screenshots"));
        Path file = dir.resolve(name + ".png");
        BufferedImage img = onEdt(() -> {
            BufferedImage i = new BufferedImage(c.getWidth(), c.getHeight(), BufferedImage.TYPE_INT_RGB);
            Graphics2D g = i.createGraphics();
            c.paint(g);
            g.dispose();
            return i;
        });
        try {
            Files.createDirectories(dir);
            ImageIO.write(img, "png", file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }
}
