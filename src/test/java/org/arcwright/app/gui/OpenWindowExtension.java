package org.arcwright.app.gui;

import java.awt.Frame;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.arcwright.app.shell.MainWindow;
import org.assertj.swing.core.Robot;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

/**
 * The real window a GUI test class drives, opened once before its tests over a fresh config folder and
 * closed after them, before the folder is deleted (the notes index and background writes live there).
 * Register it as a static field; its callbacks run before the class's own {@code @BeforeAll} and after
 * its {@code @AfterAll}. It fills the class's static, non-final fields of type {@link MainWindow},
 * {@link FrameFixture}, {@link Robot} and {@link Path} (the config folder), as JUnit fills a
 * {@code @TempDir} field:
 * <pre>{@code
 * @RegisterExtension
 * static final OpenWindowExtension opened = new OpenWindowExtension()
 *         .readyWhen(w -> w.statusLine().message().startsWith("Ready"));
 * private static MainWindow window;
 * }</pre>
 * Waiting is on the window's own state ({@link GuiSupport#waitFor}), never a fixed sleep.
 */
final class OpenWindowExtension implements BeforeAllCallback, AfterAllCallback {
    private static final int READY_SECONDS = 60;

    private final Predicate<MainWindow> ready;
    private final int width;
    private final int height;
    private Path config;
    private GuiSupport.OpenWindow open;

    OpenWindowExtension() {
        this(w -> true, 0, 0);
    }

    private OpenWindowExtension(Predicate<MainWindow> ready, int width, int height) {
        this.ready = ready;
        this.width = width;
        this.height = height;
    }

    /** Waits after opening, up to a minute, until {@code condition} holds on the event thread. */
    OpenWindowExtension readyWhen(Predicate<MainWindow> condition) {
        return new OpenWindowExtension(condition, width, height);
    }

    /** Puts the frame, no longer maximised, at {@code w} x {@code h} once it is ready. */
    OpenWindowExtension size(int w, int h) {
        return new OpenWindowExtension(ready, w, h);
    }

    @Override
    public void beforeAll(ExtensionContext context) throws IOException {
        GuiSupport.requireDisplay();
        config = Files.createTempDirectory("arcwright-gui-");
        open = GuiSupport.openWindow(config);
        MainWindow w = open.window();
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> ready.test(w)), READY_SECONDS);
        inject(context.getRequiredTestClass());
        if (width > 0) {
            GuiSupport.onEdt(() -> {
                w.frame().setExtendedState(Frame.NORMAL);
                w.frame().setSize(width, height);
                w.frame().validate();
            });
            GuiSupport.settle(300);
        }
    }

    @Override
    public void afterAll(ExtensionContext context) throws IOException {
        try {
            if (open != null) open.close();
        } finally {
            open = null;
            if (config != null) delete(config);
            config = null;
        }
    }

    /** The config folder the window runs over; tests may write their files here too. */
    Path config() { return config; }

    MainWindow window() { return open.window(); }

    FrameFixture fixture() { return open.fixture(); }

    Robot robot() { return open.robot(); }

    private void inject(Class<?> testClass) {
        for (Field f : testClass.getDeclaredFields()) {
            int m = f.getModifiers();
            if (!Modifier.isStatic(m) || Modifier.isFinal(m)) continue;
            Object value = f.getType() == MainWindow.class ? open.window()
                    : f.getType() == FrameFixture.class ? open.fixture()
                    : f.getType() == Robot.class ? open.robot()
                    : f.getType() == Path.class ? config : null;
            if (value == null) continue;
            try {
                f.setAccessible(true);
                f.set(null, value);
            } catch (IllegalAccessException e) {
                throw new IllegalStateException("cannot set " + f, e);
            }
        }
    }

    private static void delete(Path root) throws IOException {
        try (Stream<Path> paths = Files.walk(root)) {
            paths.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        }
    }
}
