package org.arcwright.app.model;

import java.util.List;
import java.util.Objects;
import java.util.concurrent.CopyOnWriteArrayList;

/** A list of change callbacks, so a view model can tell its views to refresh without knowing them. */
public final class Listeners {
    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();

    public void add(Runnable listener) { listeners.add(Objects.requireNonNull(listener, "listener")); }

    public void remove(Runnable listener) { listeners.remove(listener); }

    public void fire() {
        for (Runnable r : listeners) r.run();
    }
}
