package org.arcwright.app.shell;

import java.nio.file.Path;
import java.time.Clock;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.arcwright.app.model.RecoveryStore;
import org.arcwright.app.model.SettingsStore;
import org.arcwright.io.JsonFiles;
import org.arcwright.worksheet.WorksheetFiles;

/**
 * The collaborators the window is built from, gathered so that tests can build a window over a
 * temporary config directory. {@code background} runs long work (advice, indexing, inspection);
 * {@code io} writes settings and autosaves in order; {@code search} runs notes searches one at a time.
 * The notes index and the default personal pack live under {@code configDir} too.
 */
public record AppServices(Path configDir, JsonFiles json, WorksheetFiles files, SettingsStore settings,
                          RecoveryStore recovery, ExecutorService background, ExecutorService io,
                          ExecutorService search, Clock clock) {

    /** The standard services over {@code configDir}. */
    public static AppServices over(Path configDir) {
        JsonFiles json = new JsonFiles();
        return new AppServices(configDir, json, new WorksheetFiles(json), new SettingsStore(configDir, json),
                new RecoveryStore(configDir, json), Executors.newFixedThreadPool(2, daemon("arcwright-work")),
                Executors.newSingleThreadExecutor(daemon("arcwright-io")),
                Executors.newSingleThreadExecutor(daemon("arcwright-search")), Clock.systemUTC());
    }

    /** The folder under which the notes index is cached. */
    public Path notesIndexRoot() { return configDir.resolve("notes-index"); }

    /** The personal practice pack used when the settings name none. */
    public Path defaultPersonalPack() { return configDir.resolve("personal-pack"); }

    /** Stops the worker threads, letting queued writes finish. */
    public void shutdown() {
        background.shutdownNow();
        search.shutdownNow();
        io.shutdown();
        try {
            io.awaitTermination(5, TimeUnit.SECONDS);
            background.awaitTermination(5, TimeUnit.SECONDS);
            search.awaitTermination(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static ThreadFactory daemon(String name) {
        AtomicInteger n = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, name + "-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }
}
