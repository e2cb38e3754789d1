package org.arcwright.app.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.worksheet.WorksheetFiles;

/**
 * The worksheet open in the window: its file, the selected feature, whether it differs from what is
 * saved, and undo/redo of every edit. Every edit goes through here so that undo, autosave and the
 * views all see the same change.
 */
public final class WorksheetSession {
    private final WorksheetFiles files;
    private final UndoHistory<PartWorksheet> history = new UndoHistory<>(200);
    private final Listeners listeners = new Listeners();
    private PartWorksheet worksheet;
    private PartWorksheet saved;
    private Path file;
    private String selectedId;
    private long revision;
    private long document;
    /** Points of the inspections run in this window, by feature id: the worksheet keeps only verdicts. */
    private final Map<String, MeasuredPoints> measured = new HashMap<>();

    public WorksheetSession(WorksheetFiles files, PartWorksheet initial, Path file) {
        this.files = Objects.requireNonNull(files, "files");
        this.worksheet = Objects.requireNonNull(initial, "initial");
        this.saved = initial;
        this.file = file;
        this.selectedId = initial.features().isEmpty() ? null : initial.features().get(0).id();
    }

    /** Called after every change of worksheet, file or selection. */
    public Listeners listeners() { return listeners; }

    public PartWorksheet worksheet() { return worksheet; }

    public Optional<Path> file() { return Optional.ofNullable(file); }

    /** True when the worksheet has edits not yet saved (a fresh or demo worksheet is not dirty until edited). */
    public boolean isDirty() { return !worksheet.equals(saved); }

    /** Grows with every change; autosave compares it. */
    public long revision() { return revision; }

    /** Grows each time another worksheet is shown (open, new, demo, restore); views drop what belonged to the last one. */
    public long document() { return document; }

    /** A short title for the window: file name or part number, with a mark when unsaved. */
    public String title() {
        String name = file == null ? worksheet.part().number() : file.getFileName().toString();
        return (isDirty() ? "• " : "") + name;
    }

    public Optional<RadiusFeature> selected() {
        return selectedId == null ? Optional.empty() : worksheet.feature(selectedId);
    }

    public void select(String id) {
        String next = id != null && worksheet.feature(id).isPresent() ? id : null;
        if (Objects.equals(next, selectedId)) return;
        selectedId = next;
        changed();
    }

    // ---- edits (each undoable) ----

    /** Adds a new open feature after the selection (or at the end) and selects it. */
    public RadiusFeature addFeature() {
        String id = worksheet.nextFeatureId();
        DesignCase c = new DesignCase(worksheet.units(), worksheet.standard(), "New fillet", BlendKind.FILLET,
                worksheet.units() == Units.INCH ? 0.06 : 1.0, BlendFunction.COSMETIC,
                Loading.NONE, false, false, List.of(), Process.MACHINED,
                null, null, null);
        RadiusFeature f = new RadiusFeature(id, c, null, null);
        edit("Add " + id, worksheet.withFeatureAt(insertionIndex(), f));
        selectedId = id;
        changed();
        return f;
    }

    /** Copies the selected feature under a new id, placed after it, and selects the copy. */
    public Optional<RadiusFeature> duplicateSelected() {
        Optional<RadiusFeature> sel = selected();
        if (sel.isEmpty()) return Optional.empty();
        String id = worksheet.nextFeatureId();
        RadiusFeature copy = sel.get().withId(id).withInspection(null);
        edit("Duplicate " + sel.get().id(), worksheet.withFeatureAt(insertionIndex(), copy));
        selectedId = id;
        changed();
        return Optional.of(copy);
    }

    /** Deletes the selected feature and selects its neighbour. */
    public boolean deleteSelected() {
        Optional<RadiusFeature> sel = selected();
        if (sel.isEmpty()) return false;
        int i = worksheet.features().indexOf(sel.get());
        PartWorksheet next = worksheet.withoutFeature(sel.get().id());
        edit("Delete " + sel.get().id(), next);
        List<RadiusFeature> fs = next.features();
        selectedId = fs.isEmpty() ? null : fs.get(Math.min(i, fs.size() - 1)).id();
        forgetMeasuredOfGoneFeatures();
        changed();
        return true;
    }

    /**
     * Drops the measured points of features no longer in the worksheet, so that a feature added
     * later under a freed id never shows another feature's points.
     */
    private void forgetMeasuredOfGoneFeatures() {
        measured.keySet().removeIf(id -> worksheet.features().stream().noneMatch(f -> f.id().equals(id)));
    }

    /**
     * Replaces the case of feature {@code id}; a changed case clears the chosen callout and with it
     * the verdict judged against that callout.
     */
    public void updateCase(String id, DesignCase c) {
        RadiusFeature f = require(id);
        if (f.designCase().equals(c)) return;
        edit("Edit " + id, worksheet.withFeature(f.withCase(c).withInspection(null)));
    }

    /**
     * Puts {@code r} on the drawing for feature {@code id}, keeping the case it was decided for; a
     * verdict judged against another callout or case does not stay with the new one.
     */
    public void choose(String id, DesignCase c, Recommendation r) {
        RadiusFeature f = require(id);
        boolean sameCallout = f.chosen() != null && r != null && Objects.equals(f.chosen().callout(), r.callout())
                && f.designCase().equals(c);
        RadiusFeature next = new RadiusFeature(f.id(), c, r, sameCallout ? f.inspection() : null);
        edit("Choose " + (r.text() == null ? r.ruleId() : r.text()) + " for " + id, worksheet.withFeature(next));
    }

    /**
     * Keeps the outcome of inspecting a measured contour of feature {@code id}.
     *
     * @throws IllegalStateException when the feature has no chosen callout: an undecided feature keeps no verdict
     */
    public void recordInspection(String id, InspectionRecord record) {
        RadiusFeature f = require(id);
        if (f.chosen() == null) throw new IllegalStateException(id + " has no chosen callout: an undecided feature keeps no verdict");
        edit("Inspect " + id, worksheet.withFeature(f.withInspection(record)));
    }

    /**
     * Keeps the points of an inspection of feature {@code id} for the Zone view, for this session
     * only (not an edit: the worksheet does not change and nothing is saved).
     */
    public void keepMeasured(String id, MeasuredPoints points) {
        measured.put(Objects.requireNonNull(id, "id"), Objects.requireNonNull(points, "points"));
        listeners.fire();
    }

    /** The points last checked for feature {@code id} in this session, if any. */
    public Optional<MeasuredPoints> measured(String id) {
        return Optional.ofNullable(id == null ? null : measured.get(id));
    }

    public boolean canUndo() { return history.canUndo(); }

    public boolean canRedo() { return history.canRedo(); }

    public Optional<String> undoLabel() { return history.undoLabel(); }

    public Optional<String> redoLabel() { return history.redoLabel(); }

    public void undo() {
        if (!history.canUndo()) return;
        worksheet = history.undo(worksheet);
        keepSelectionValid();
        forgetMeasuredOfGoneFeatures();
        changed();
    }

    public void redo() {
        if (!history.canRedo()) return;
        worksheet = history.redo(worksheet);
        keepSelectionValid();
        forgetMeasuredOfGoneFeatures();
        changed();
    }

    // ---- files ----

    /** Replaces the session's content with the worksheet in {@code path}; throws InputProblem on bad content. */
    public void open(Path path) {
        PartWorksheet read = files.read(path);
        replace(read, path, read);
    }

    /** Shows {@code ws} as unsaved edits (a recovered autosave of {@code origin}, which may be null). */
    public void showUnsaved(PartWorksheet ws, Path origin) {
        replace(ws, origin, null);
    }

    /** Shows {@code ws} with no file and no edits yet (the demo). */
    public void showFresh(PartWorksheet ws) {
        replace(ws, null, ws);
    }

    /** Saves to the current file; false when there is none yet (the view asks where). */
    public boolean save() {
        if (file == null) return false;
        saveAs(file);
        return true;
    }

    /** Saves atomically to {@code path}, which becomes the current file. */
    public void saveAs(Path path) {
        Path target = path.toString().endsWith(WorksheetFiles.EXTENSION) ? path
                : path.resolveSibling(path.getFileName() + WorksheetFiles.EXTENSION);
        files.write(target, worksheet);
        file = target;
        saved = worksheet;
        changed();
    }

    /** A new empty worksheet. */
    public void newWorksheet(Units units, DrawingStyle standard) {
        showFresh(PartWorksheet.empty(new PartWorksheet.PartInfo("NEW-PART", "New part", null, null, "A"), units, standard));
    }

    private void replace(PartWorksheet ws, Path path, PartWorksheet savedState) {
        worksheet = ws;
        file = path;
        saved = savedState;
        history.clear();
        measured.clear();
        document++;
        selectedId = ws.features().isEmpty() ? null : ws.features().get(0).id();
        changed();
    }

    private void edit(String label, PartWorksheet next) {
        if (next.equals(worksheet)) return;
        history.record(label, worksheet);
        worksheet = next;
        changed();
    }

    private RadiusFeature require(String id) {
        return worksheet.feature(id).orElseThrow(() -> new IllegalArgumentException("no feature " + id));
    }

    private int insertionIndex() {
        Optional<RadiusFeature> sel = selected();
        return sel.map(f -> worksheet.features().indexOf(f) + 1).orElse(worksheet.features().size());
    }

    private void keepSelectionValid() {
        if (selectedId == null || worksheet.feature(selectedId).isEmpty()) {
            List<RadiusFeature> fs = new ArrayList<>(worksheet.features());
            selectedId = fs.isEmpty() ? null : fs.get(0).id();
        }
    }

    private void changed() {
        revision++;
        listeners.fire();
    }
}
