package org.arcwright.app.decide;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.KeyboardFocusManager;
import java.awt.Point;
import java.awt.Toolkit;
import java.awt.datatransfer.StringSelection;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.ComponentListener;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;
import java.util.function.BiFunction;
import java.util.function.Consumer;
import java.util.function.Function;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextField;
import javax.swing.ScrollPaneConstants;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.AdviceSource;
import org.arcwright.app.model.NeedsSummary;
import org.arcwright.app.widgets.ImageSelection;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Need;
import org.arcwright.app.model.AnswerDrafts;
import org.arcwright.app.model.DecideForm;
import org.arcwright.app.model.Numbers;
import org.arcwright.app.model.Question;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.Cautions;
import org.arcwright.app.widgets.ScrollablePanel;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.app.widgets.Themes;
import org.arcwright.app.widgets.TextEdits;
import org.arcwright.render.Palette;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.LimitsReport;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The Decide panel: a guided form for the selected feature's case, every question with its help
 * text and, when the answer is wrong, what is wrong in its place; the limits of the tolerance intent
 * as you type; and the ranked recommendations, one of which goes on the worksheet.
 */
public final class DecidePanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient DecideForm form;
    private final transient WorksheetSession session;
    private final transient AnswerDrafts drafts;
    private final transient Executor background;
    private final transient Consumer<String> status;
    private transient AdviceSource advice;
    private transient BiFunction<Recommendation, Palette, BufferedImage> frames = (r, p) -> null;
    private transient Map<Recommendation, BufferedImage> frameImages = Map.of();
    private final Map<Question, JComponent> fields = new EnumMap<>(Question.class);
    private final Map<Question, WrapLabel> notes = new EnumMap<>(Question.class);
    private final JPanel figures = new JPanel(new MigLayout("insets 0, wrap 2, gap 12 2", "[][grow,fill]", ""));
    private final JLabel featureTitle = new JLabel();
    private final JScrollPane formScroll;
    private final JScrollPane resultsScroll;
    private final JPanel cards = new JPanel(new MigLayout("insets 0, wrap 1, gap 0 10", "[grow,fill]", ""));
    private final Timer adviseLater = new Timer(250, e -> adviseNow());
    private final JButton keep = new JButton("Keep these answers");
    private final WrapLabel unkeptNote = new WrapLabel("", "Arcwright.help.font", "Arcwright.error.foreground");
    private transient List<Recommendation> shown = List.of();
    /** The advice the cards came from; null when none is shown. */
    private transient Advice shownAdvice;
    private String featureId;
    private DesignCase loadedCase;
    /** The answers as the worksheet holds them for the feature shown: anything else is not kept yet. */
    private transient DecideForm.Draft loadedAnswers;
    /** Narrowest the form and the results may be dragged, px: a field with its help, a card with its frame. */
    private static final int FORM_MIN_WIDTH = 280, RESULTS_MIN_WIDTH = 320;
    private long document;
    private boolean binding;
    private long generation;

    public DecidePanel(DecideForm form, WorksheetSession session, AnswerDrafts drafts, AdviceSource advice,
                       Executor background, Consumer<String> status) {
        super(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[][grow,fill]"));
        this.form = Objects.requireNonNull(form, "form");
        this.session = Objects.requireNonNull(session, "session");
        this.drafts = Objects.requireNonNull(drafts, "drafts");
        this.document = session.document();
        this.advice = Objects.requireNonNull(advice, "advice");
        this.background = Objects.requireNonNull(background, "background");
        this.status = Objects.requireNonNull(status, "status");
        setName("decidePanel");
        adviseLater.setRepeats(false);
        add(Cautions.box(Cautions.ADVICE));
        formScroll = scroll(buildForm());
        resultsScroll = scroll(buildResults());
        resultsScroll.setName("resultsScroll");
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, formScroll, resultsScroll);
        split.setName("decideSplit");
        // neither side can be dragged narrower than its fields and cards stay readable at; a window
        // too narrow for both still shares the width by the weight
        formScroll.setMinimumSize(new Dimension(FORM_MIN_WIDTH, 0));
        resultsScroll.setMinimumSize(new Dimension(RESULTS_MIN_WIDTH, 0));
        split.setResizeWeight(0.45);
        split.setContinuousLayout(true);
        split.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { splitFirstSized(split, this); }
        });
        split.setBorder(null);
        add(split);
        form.listeners().add(this::formChanged);
        session.listeners().add(this::sessionChanged);
        sessionChanged();
    }

    /**
     * Sets how feature control frames are drawn for the cards (once the frame renderer is
     * available), in the colours of the current look.
     */
    public void setFrames(BiFunction<Recommendation, Palette, BufferedImage> renderer) {
        this.frames = Objects.requireNonNull(renderer, "renderer");
        adviseNow();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        // the frame previews are images in the old look's colours: draw them again
        // (the fields are null while constructing, and a closed window's pool is shut)
        if (form != null && advice != null && frames != null && isDisplayable()) adviseNow();
    }

    /** Puts the divider at 45% the first time the split has a size; the user moves it after that. */
    private static void splitFirstSized(JSplitPane split, ComponentListener self) {
        if (split.getWidth() <= 0) return;
        split.setDividerLocation(0.45);
        split.removeComponentListener(self);
        split.addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { keepMinimums(split); }
        });
    }

    /**
     * Moves the divider back between the two sides' minimum widths after the split was resized: the
     * resize weight shares a change of width without looking at them, so a window opened wide and
     * made narrow left the form narrower than it stays readable at.
     */
    private static void keepMinimums(JSplitPane split) {
        int left = split.getLeftComponent().getMinimumSize().width;
        int right = split.getRightComponent().getMinimumSize().width;
        int room = split.getWidth() - split.getDividerSize();
        if (room < left + right) return;
        int at = split.getDividerLocation();
        if (at < left) split.setDividerLocation(left);
        else if (at > room - right) split.setDividerLocation(room - right);
    }

    /** Replaces where recommendations come from (when the practice packs have loaded). */
    public void setAdviceSource(AdviceSource source) {
        this.advice = Objects.requireNonNull(source, "source");
        adviseNow();
    }

    /** The field bound to question {@code q} (for tests and keyboard focus). */
    public JComponent field(Question q) { return fields.get(q); }

    private static JScrollPane scroll(JComponent c) {
        JScrollPane s = new JScrollPane(c, ScrollPaneConstants.VERTICAL_SCROLLBAR_AS_NEEDED,
                ScrollPaneConstants.HORIZONTAL_SCROLLBAR_NEVER);
        s.setBorder(null);
        s.getVerticalScrollBar().setUnitIncrement(16);
        return s;
    }

    private JPanel buildForm() {
        JPanel p = new ScrollablePanel(new MigLayout("insets 4 4 12 12, wrap 1, gap 0 2", "[grow,fill]", ""));
        featureTitle.putClientProperty(FlatClientProperties.STYLE_CLASS, "h3");
        featureTitle.setName("decideFeature");
        p.add(featureTitle, "wmin 10, gapbottom 2");
        keep.setName("keepAnswers");
        keep.addActionListener(e -> keepAnswers());
        p.add(keep, "left, growx 0, gapbottom 2");
        unkeptNote.setName("unkeptAnswers");
        p.add(unkeptNote, "wmin 10, hidemode 3, gapbottom 6");
        section(p, "The radius");
        text(p, Question.FEATURE);
        combo(p, Question.KIND, BlendKind.values(), form::setKind);
        text(p, Question.NOMINAL);
        combo(p, Question.FUNCTION, BlendFunction.values(), form::setFunction);
        combo(p, Question.LOADING, Loading.values(), form::setLoading);
        section(p, "What matters");
        check(p, Question.FORM_MATTERS, form::setFormMatters);
        check(p, Question.LOCATION_MATTERS, form::setLocationMatters);
        text(p, Question.DATUMS);
        section(p, "The drawing");
        combo(p, Question.PROCESS, Process.values(), form::setProcess);
        combo(p, Question.STANDARD, DrawingStyle.values(), form::setStandard);
        combo(p, Question.UNITS, Units.values(), form::setUnits);
        text(p, Question.TOLERANCE);
        text(p, Question.ANGLE);
        section(p, "Stress concentration");
        check(p, Question.STRESS, form::setStressEnabled);
        choice(p, Question.SHAPE);
        choice(p, Question.LOAD);
        text(p, Question.BIG_D);
        text(p, Question.SMALL_D);
        text(p, Question.STRENGTH);
        choice(p, Question.STRENGTH_UNITS);
        text(p, Question.TARGET_KT);
        section(p, "Mating corner");
        check(p, Question.MATING, form::setMatingEnabled);
        choice(p, Question.CORNER);
        text(p, Question.CORNER_SIZE);
        text(p, Question.CORNER_ANGLE);
        return p;
    }

    private JPanel buildResults() {
        JPanel p = new ScrollablePanel(new MigLayout("insets 4 12 12 4, wrap 1, gap 6", "[grow,fill]", ""));
        JLabel h1 = new JLabel("Your tolerance at this corner");
        h1.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        p.add(h1);
        figures.setName("limitsFigures");
        figures.setOpaque(false);
        p.add(figures, "wmin 10");
        JLabel h2 = new JLabel("Recommendations, best first");
        h2.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        p.add(h2, "gaptop 10");
        cards.setOpaque(false);
        cards.setName("cards");
        p.add(cards, "wmin 10");
        return p;
    }

    private static void section(JPanel p, String title) {
        JLabel l = new JLabel(title);
        l.putClientProperty(FlatClientProperties.STYLE_CLASS, "h4");
        p.add(l, "gaptop 12, gapbottom 2");
    }

    private void text(JPanel p, Question q) {
        JTextField f = new JTextField(form.text(q), 14);
        TextEdits.onEdit(f.getDocument(), () -> typed(q, f));
        row(p, q, f);
    }

    private <E> void combo(JPanel p, Question q, E[] values, Consumer<E> setter) {
        JComboBox<E> c = new JComboBox<>(values);
        c.setRenderer(new KeyRenderer());
        c.addActionListener(e -> picked(c, setter));
        row(p, q, c);
    }

    private void choice(JPanel p, Question q) {
        JComboBox<String> c = new JComboBox<>(DecideForm.choices(q).toArray(new String[0]));
        c.addActionListener(e -> typedChoice(q, c));
        row(p, q, c);
    }

    private void check(JPanel p, Question q, Consumer<Boolean> setter) {
        JCheckBox c = new JCheckBox(q.label());
        c.addActionListener(e -> ticked(c, setter));
        c.setName("q." + q.name());
        c.setToolTipText(q.help());
        fields.put(q, c);
        p.add(c, "wmin 10, gaptop 4");
        note(p, q);
    }

    private void row(JPanel p, Question q, JComponent c) {
        c.setName("q." + q.name());
        c.setToolTipText(q.help());
        JLabel l = new JLabel(q.label());
        l.setLabelFor(c);
        fields.put(q, c);
        p.add(l, "gaptop 4");
        p.add(c, "wmin 10");
        note(p, q);
    }

    private void note(JPanel p, Question q) {
        WrapLabel n = new WrapLabel(q.help(), "Arcwright.help.font", "Arcwright.help.foreground");
        n.setName("note." + q.name());
        notes.put(q, n);
        p.add(n, "wmin 10, gapleft 2");
    }

    // ---- listeners: one line each, dispatching to the form ----

    private void typed(Question q, JTextField f) { if (!binding) form.setText(q, f.getText()); }

    private void typedChoice(Question q, JComboBox<String> c) { if (!binding) form.setText(q, (String) c.getSelectedItem()); }

    private <E> void picked(JComboBox<E> c, Consumer<E> setter) {
        if (!binding) setter.accept(c.getItemAt(c.getSelectedIndex()));
    }

    private void ticked(JCheckBox c, Consumer<Boolean> setter) { if (!binding) setter.accept(c.isSelected()); }

    // ---- model to view ----

    private void sessionChanged() {
        if (session.document() != document) {
            // another worksheet: the window asked before dropping answers not kept
            document = session.document();
            drafts.clear();
            featureId = null;
        }
        Optional<RadiusFeature> sel = session.selected();
        if (sel.isEmpty()) {
            leaveFeature();
            featureId = null;
            featureTitle.setText("No feature selected: add one in the Part panel");
            setCards(null);
            refreshKeep();
            return;
        }
        RadiusFeature f = sel.get();
        featureTitle.setText(f.id() + (f.designCase().feature() == null ? "" : "  " + f.designCase().feature()));
        if (!f.id().equals(featureId)) {
            leaveFeature();
            featureId = f.id();
            loadedCase = f.designCase();
            form.load(f.designCase());
            loadedAnswers = form.draft();
            drafts.take(f.id()).ifPresent(d -> {
                form.restore(d);
                status.accept("Restored the answers you typed for " + f.id() + ": Keep these answers puts them on the worksheet");
            });
            // a feature's form opens at its first question; filling the text fields moved their carets,
            // and a caret scrolls its field into view after the event that moved it
            SwingUtilities.invokeLater(() -> formScroll.getViewport().setViewPosition(new Point(0, 0)));
        } else if (!f.designCase().equals(loadedCase)) {
            loadedCase = f.designCase();
            form.load(f.designCase());
            loadedAnswers = form.draft();
        } else {
            renderCards();
        }
        refreshKeep();
    }

    /** Keeps the answers typed for the feature being left, if they differ from the worksheet's, and says so. */
    private void leaveFeature() {
        if (featureId == null || loadedAnswers == null || !hasUnkeptAnswers()) return;
        if (session.worksheet().feature(featureId).isEmpty()) return;
        drafts.put(featureId, form.draft());
        status.accept("The answers typed for " + featureId + " are not kept yet: select " + featureId
                + " again to keep them (they are held until then)");
    }

    /** Whether the form holds answers the worksheet does not have. */
    private boolean hasUnkeptAnswers() { return loadedAnswers != null && !form.draft().equals(loadedAnswers); }

    /** The features with answers typed but not kept on the worksheet: the one shown, then any left behind. */
    public List<String> unkeptAnswers() {
        List<String> out = new ArrayList<>();
        if (featureId != null && hasUnkeptAnswers()) out.add(featureId);
        for (String id : drafts.features()) if (!out.contains(id)) out.add(id);
        return out;
    }

    private void formChanged() {
        binding = true;
        try {
            for (Map.Entry<Question, JComponent> e : fields.entrySet()) bind(e.getKey(), e.getValue());
        } finally {
            binding = false;
        }
        for (Map.Entry<Question, WrapLabel> e : notes.entrySet()) {
            Optional<String> problem = form.problem(e.getKey());
            e.getValue().show(problem.orElse(e.getKey().help()),
                    problem.isPresent() ? "Arcwright.error.foreground" : "Arcwright.help.foreground");
        }
        boolean s = form.stressEnabled();
        for (Question q : List.of(Question.SHAPE, Question.LOAD, Question.BIG_D, Question.SMALL_D, Question.STRENGTH,
                Question.STRENGTH_UNITS, Question.TARGET_KT)) enable(q, s, "tick 'Check stress concentration' first");
        boolean m = form.matingEnabled();
        for (Question q : List.of(Question.CORNER, Question.CORNER_SIZE, Question.CORNER_ANGLE)) {
            enable(q, m, "tick 'Check the mating corner' first");
        }
        showFigures();
        refreshKeep();
        adviseLater.restart();
    }

    private void refreshKeep() {
        Optional<DesignCase> c = form.toCase();
        boolean changed = c.isPresent() && featureId != null && !c.get().equals(loadedCase);
        boolean unkept = featureId != null && hasUnkeptAnswers();
        unkeptNote.setVisible(unkept);
        unkeptNote.show(unkept ? "These answers are not on the worksheet yet: Keep these answers (or choose a "
                + "recommendation) puts them there." : "", "Arcwright.error.foreground");
        keep.setEnabled(changed);
        keep.setToolTipText(featureId == null ? "Unavailable: no feature is selected"
                : c.isEmpty() ? "Unavailable: answer the questions marked in red first"
                : !changed ? "Unavailable: the answers are the ones on the worksheet"
                : "Save these answers to " + featureId + " without choosing a callout (clears its chosen callout; Ctrl+Z undoes)");
    }

    private void keepAnswers() {
        Optional<DesignCase> c = form.toCase();
        if (featureId == null || c.isEmpty()) return;
        loadedCase = c.get();
        session.updateCase(featureId, c.get());
        loadedAnswers = form.draft();
        status.accept("Kept the answers for " + featureId + " (Ctrl+Z to undo)");
        refreshKeep();
    }

    private void enable(Question q, boolean on, String why) {
        JComponent c = fields.get(q);
        c.setEnabled(on);
        c.setToolTipText(on ? q.help() : "Unavailable: " + why);
    }

    @SuppressWarnings("unchecked")
    private void bind(Question q, JComponent c) {
        if (c instanceof JTextField) {
            JTextField f = (JTextField) c;
            if (!f.getText().equals(form.text(q))) {
                f.setText(form.text(q));
                f.setCaretPosition(0);
            }
        } else if (c instanceof JCheckBox) {
            JCheckBox b = (JCheckBox) c;
            b.setSelected(checked(q));
        } else if (c instanceof JComboBox) {
            JComboBox<Object> box = (JComboBox<Object>) c;
            Object v = selectedValue(q);
            if (!Objects.equals(box.getSelectedItem(), v)) box.setSelectedItem(v);
        }
    }

    private boolean checked(Question q) {
        switch (q) {
            case FORM_MATTERS: return form.formMatters();
            case LOCATION_MATTERS: return form.locationMatters();
            case STRESS: return form.stressEnabled();
            case MATING: return form.matingEnabled();
            default: return false;
        }
    }

    private Object selectedValue(Question q) {
        switch (q) {
            case KIND: return form.kind();
            case FUNCTION: return form.function();
            case LOADING: return form.loading();
            case PROCESS: return form.process();
            case STANDARD: return form.standard();
            case UNITS: return form.units();
            default: return form.text(q);
        }
    }

    private void showFigures() {
        figures.removeAll();
        Optional<LimitsReport> r = form.limits();
        if (r.isEmpty()) {
            figures.add(new WrapLabel(form.text(Question.TOLERANCE).isBlank()
                    ? "No tolerance intent given: the title block's general tolerance applies."
                    : "Fix the tolerance intent to see its limits.", "Label.font", "Arcwright.help.foreground"), "span 2, growx, wmin 10");
        } else {
            LimitsReport l = r.get();
            String u = " " + form.units().symbol();
            figure("As drawn (ASME)", l.asme());
            figure("As drawn (ISO)", l.iso());
            figure("Smallest radius", l.min() == null ? "open (MAX only)" : Numbers.fixed(l.min(), 4) + u);
            figure("Largest radius", l.max() == null ? "open (MIN only)" : Numbers.fixed(l.max(), 4) + u);
            if (l.crescent() != null) {
                figure("Crescent width (bisector)", Numbers.fixed(l.crescent().width(), 4) + u);
                figure("Equal-bilateral profile", l.profileZone() == null ? "none (no nominal arc)" : Numbers.fixed(l.profileZone(), 4) + u);
                figure("Shortcut profile (2 × the larger deviation)", l.shortcutProfile() == null ? "none (no deviation)" : Numbers.fixed(l.shortcutProfile(), 4) + u);
            }
            for (String remark : l.remarks()) figures.add(new WrapLabel(remark, "Label.font", null), "span 2, growx, wmin 10, gaptop 4");
        }
        figures.revalidate();
        figures.repaint();
    }

    private void figure(String label, String value) {
        // wrapping text: the narrow box must not cut a label off mid-word
        WrapLabel l = new WrapLabel(label, "Label.font", null);
        figures.add(l, "wmin 10, top");
        JLabel v = new JLabel(value);
        v.setName("figure." + label);
        v.setFont(Themes.font("Arcwright.figure.font").deriveFont(Font.BOLD));
        figures.add(v, "top");
    }

    /** The advice the cards show now; null when none. */
    public Advice shownAdvice() { return shownAdvice; }

    /** The recommendations shown now, best first. */
    public List<Recommendation> shownRecommendations() { return shown; }

    /** The figures shown for the tolerance intent, as label and value pairs, for tests. */
    public String figuresText() {
        StringBuilder sb = new StringBuilder();
        for (Component c : figures.getComponents()) {
            if (c instanceof JLabel) sb.append(((JLabel) c).getText()).append('\n');
            if (c instanceof WrapLabel) sb.append(((WrapLabel) c).getText()).append('\n');
        }
        return sb.toString();
    }

    private void adviseNow() {
        long g = ++generation;
        Optional<DesignCase> c = form.toCase();
        if (c.isEmpty()) {
            setCards(null);
            return;
        }
        AdviceSource source = advice;
        BiFunction<Recommendation, Palette, BufferedImage> frameDrawer = frames;
        Palette ink = Themes.drawingPalette("Arcwright.card.background");
        Function<Recommendation, BufferedImage> draw = r -> frameDrawer.apply(r, ink);
        CompletableFuture.supplyAsync(() -> withFrames(source.advise(c.get()), draw), background)
                .whenComplete((list, error) -> SwingUtilities.invokeLater(() -> advised(g, list, error)));
    }

    private record Advised(Advice advice, Map<Recommendation, BufferedImage> frames) {}

    private static Advised withFrames(Advice advice,
                                      Function<Recommendation, BufferedImage> draw) {
        Map<Recommendation, BufferedImage> images = new HashMap<>();
        for (Recommendation r : advice.recommendations()) {
            try {
                BufferedImage img = draw.apply(r);
                if (img != null) images.put(r, img);
            } catch (RuntimeException e) {
                // a frame that cannot be drawn is left out; the callout text still shows
            }
        }
        return new Advised(advice, images);
    }

    private void advised(long g, Advised a, Throwable error) {
        if (g != generation) return;
        if (error != null) {
            status.accept("Advice failed: " + error.getMessage());
            setCards(null);
            return;
        }
        frameImages = a.frames();
        setCards(a.advice());
    }

    /**
     * Scrolls the recommendations back to the best card once the rebuilt cards are laid out: new
     * advice, a callout put on the worksheet and a change of look all open at the top.
     */
    private void showBestCard() {
        SwingUtilities.invokeLater(() -> resultsScroll.getViewport().setViewPosition(new Point(0, 0)));
    }

    /** How far the recommendations are scrolled down, in pixels (tests: 0 shows the best card first). */
    public int resultsScrolledBy() { return resultsScroll.getViewport().getViewPosition().y; }

    private void setCards(Advice a) {
        shownAdvice = a;
        shown = a == null ? List.of() : a.recommendations();
        renderCards();
    }

    private void renderCards() {
        Component focus = KeyboardFocusManager.getCurrentKeyboardFocusManager().getFocusOwner();
        boolean focusInCards = focus != null && SwingUtilities.isDescendingFrom(focus, cards);
        cards.removeAll();
        Recommendation chosen = session.selected().map(RadiusFeature::chosen).orElse(null);
        if (shown.isEmpty()) {
            cards.add(new WrapLabel(form.isValid()
                    ? "No recommendation yet. Give a tolerance intent to take it as written, or wait for the practice packs."
                    : "Answer the questions marked in red to see recommendations.", "Label.font", "Arcwright.help.foreground"),
                    "wmin 10");
        }
        List<Need> needs = shownAdvice == null ? List.of() : shownAdvice.needs();
        if (shownAdvice != null && !shown.isEmpty()) {
            NeedsSummary summary = NeedsSummary.of(shownAdvice, shown);
            if (summary.nothingMeets() || !summary.changes().isEmpty()) cards.add(new NothingMeetsBlock(summary), "wmin 10");
            if (!summary.rows().isEmpty()) cards.add(new NeedsTableView(summary), "wmin 10");
        }
        int rank = 1;
        for (Recommendation r : shown) {
            boolean isChosen = chosen != null && chosen.callout().equals(r.callout()) && chosen.ruleId().equals(r.ruleId());
            cards.add(new RecommendationCard(rank++, r, NeedsSummary.cardVerdict(r, needs), form.standard(), frameImages.get(r), this::choose, this::copy, this::copyFrame, isChosen),
                    "wmin 10");
        }
        cards.revalidate();
        cards.repaint();
        if (focusInCards) keepFocusInCards();
        SwingUtilities.invokeLater(this::showBestCard);
    }

    /** After the cards are rebuilt, the keyboard focus stays on them instead of falling out of the window. */
    private void keepFocusInCards() {
        for (Component c : cards.getComponents()) {
            if (c instanceof RecommendationCard) {
                ((RecommendationCard) c).focusFirstButton();
                return;
            }
        }
        cards.requestFocusInWindow();
    }

    private void choose(Recommendation r) {
        Optional<DesignCase> c = form.toCase();
        if (featureId == null || c.isEmpty()) return;
        loadedCase = c.get();
        loadedAnswers = form.draft();
        session.choose(featureId, c.get(), r);
        status.accept("Put " + r.text() + " on " + featureId + " (Ctrl+Z to undo)");
    }

    private void copyFrame(Recommendation r) {
        BufferedImage img = frameImages.get(r);
        if (img == null) return;
        Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new ImageSelection(img), null);
        status.accept("Copied the frame of " + r.text() + " as an image");
    }

    private void copy(Recommendation r) {
        Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new StringSelection(r.text()), null);
        status.accept("Copied " + r.text());
    }

    /** Shows enum values by their file key, as the trade writes them. */
    private static final class KeyRenderer extends DefaultListCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getListCellRendererComponent(JList<?> list, Object value, int index,
                                                               boolean selected, boolean focus) {
            String text = value instanceof Enum ? keyOf(value) : String.valueOf(value);
            return super.getListCellRendererComponent(list, text, index, selected, focus);
        }

        private static String keyOf(Object v) {
            if (v instanceof BlendKind) return ((BlendKind) v).key();
            if (v instanceof BlendFunction) return ((BlendFunction) v).key();
            if (v instanceof Loading) return ((Loading) v).key();
            if (v instanceof Process) return ((Process) v).key();
            if (v instanceof DrawingStyle) return v == DrawingStyle.ASME ? "ASME Y14.5" : "ISO";
            if (v instanceof Units) return v == Units.MM ? "millimetres" : "inches";
            return String.valueOf(v);
        }
    }
}
