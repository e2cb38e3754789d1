package org.arcwright.app.model;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Decide answers typed for a feature but not yet kept on the worksheet, by feature id: the user
 * may select another feature and come back to them, and the window asks before a worksheet change
 * or quitting would drop them. Lives as long as the worksheet it belongs to.
 */
public final class AnswerDrafts {
    private final Map<String, DecideForm.Draft> drafts = new LinkedHashMap<>();
    private final Listeners listeners = new Listeners();

    /** Called when a draft is put or dropped. */
    public Listeners listeners() { return listeners; }

    public void put(String featureId, DecideForm.Draft draft) {
        drafts.put(Objects.requireNonNull(featureId, "featureId"), Objects.requireNonNull(draft, "draft"));
        listeners.fire();
    }

    /** The draft of {@code featureId}, removed from the set (the form holds it again). */
    public Optional<DecideForm.Draft> take(String featureId) {
        DecideForm.Draft d = drafts.remove(featureId);
        if (d != null) listeners.fire();
        return Optional.ofNullable(d);
    }

    /** Whether {@code featureId} has answers waiting. */
    public boolean has(String featureId) { return drafts.containsKey(featureId); }

    /** The features with answers waiting, in the order they were left. */
    public List<String> features() { return List.copyOf(drafts.keySet()); }

    public boolean isEmpty() { return drafts.isEmpty(); }

    /** Drops every draft (the worksheet they belong to was replaced, after the user agreed). */
    public void clear() {
        if (drafts.isEmpty()) return;
        drafts.clear();
        listeners.fire();
    }
}
