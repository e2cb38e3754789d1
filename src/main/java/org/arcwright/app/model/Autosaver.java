package org.arcwright.app.model;

import java.nio.file.Path;
import java.time.Clock;
import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicReference;
import org.arcwright.worksheet.PartWorksheet;

/**
 * Keeps the autosave in step with the session: unsaved edits are written off the UI thread (the
 * latest state wins when edits come faster than writes), and a clean session removes the file.
 */
public final class Autosaver {
    private record Pending(PartWorksheet worksheet, Path source, boolean dirty) {}

    private final RecoveryStore store;
    private final Executor executor;
    private final Clock clock;
    private final AtomicReference<Pending> pending = new AtomicReference<>();

    public Autosaver(RecoveryStore store, Executor executor, Clock clock) {
        this.store = Objects.requireNonNull(store, "store");
        this.executor = Objects.requireNonNull(executor, "executor");
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    /** Schedules the autosave to match the session as it is now. */
    public void sessionChanged(WorksheetSession session) {
        Pending p = new Pending(session.worksheet(), session.file().orElse(null), session.isDirty());
        if (pending.getAndSet(p) == null) executor.execute(this::flush);
    }

    private void flush() {
        Pending p = pending.getAndSet(null);
        if (p == null) return;
        if (p.dirty()) store.write(p.worksheet(), p.source(), clock.instant());
        else store.clear();
    }
}
