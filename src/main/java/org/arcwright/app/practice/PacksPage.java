package org.arcwright.app.practice;

import java.nio.file.Path;
import java.util.Collections;
import java.util.List;
import java.util.function.Supplier;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.TeamPacks;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;

/**
 * The Packs page: which packs are in force, lowest layer first, and the team pack folders of the
 * settings, added (a folder that opens as a practice pack), removed and reordered here. Each change
 * goes to the settings and the packs reload; the page then shows the packs as they loaded.
 */
final class PacksPage extends JPanel {
    private static final long serialVersionUID = 1L;
    private final DefaultListModel<String> inForce = new DefaultListModel<>();
    private final DefaultListModel<String> folders = new DefaultListModel<>();
    private final JList<String> folderList = new JList<>(folders);
    private final JButton add = new JButton("Add a team pack folder…");
    private final JButton remove = new JButton("Remove");
    private final JButton up = new JButton("Move up");
    private final JButton down = new JButton("Move down");
    private final WrapLabel message = new WrapLabel(" ", "Label.font", "Arcwright.help.foreground");
    private final JLabel personalLabel = new JLabel();
    private final transient TeamPackSettings settings;
    private final transient TeamPacks teamPacks;
    private final transient Supplier<Path> personalPack;
    private String lastMessage = "";

    PacksPage(TeamPackSettings settings, TeamPacks teamPacks, Supplier<Path> personalPack) {
        super(new MigLayout("insets 8, wrap 1, gap 6", "[grow,fill]", "[][grow 40,fill][][][grow 60,fill][][][]"));
        this.settings = settings;
        this.teamPacks = teamPacks;
        this.personalPack = personalPack;
        setName("packsPage");
        folderList.setName("teamPackList");
        add.setName("teamPackAdd");
        remove.setName("teamPackRemove");
        up.setName("teamPackUp");
        down.setName("teamPackDown");
        message.setName("packsMessage");
        JList<String> inForceList = new JList<>(inForce);
        inForceList.setName("packsInForce");
        add(new JLabel("Packs in force, lowest layer first (a later pack wins over the ones above it):"));
        add(new JScrollPane(inForceList), "wmin 10, hmin 60");
        add(new JLabel("Team pack folders (from your settings; the team layers, in this order):"));
        JPanel buttons = new JPanel(new MigLayout("insets 2, gap 6", "[][][][]"));
        buttons.add(add);
        buttons.add(remove);
        buttons.add(up);
        buttons.add(down);
        add(buttons, "wmin 10");
        add(new JScrollPane(folderList), "wmin 10, hmin 60");
        add(personalLabel, "wmin 10");
        add(message, "wmin 10");
        add(new WrapLabel("A team pack is a folder with a pack.json, shared by the team (rules/, templates/, notes/, "
                + "tables/). Your personal pack is always the top layer. The packs reload after each change.",
                "Label.font", "Arcwright.help.foreground"), "wmin 10");
        add.addActionListener(e -> choose());
        remove.addActionListener(e -> removeSelected());
        up.addActionListener(e -> moveSelected(-1));
        down.addActionListener(e -> moveSelected(1));
        folderList.addListSelectionListener(e -> enableButtons());
        up.setToolTipText("Earlier in the list: a lower layer, overridden by the packs after it");
        down.setToolTipText("Later in the list: a higher layer, overriding the packs before it");
        showFolders();
    }

    /** Shows the packs as they loaded, and the settings' folders as they are now. */
    void packsLoaded(PackStack stack) {
        inForce.clear();
        TeamPacks.Summary summary = TeamPacks.summary(stack);
        for (String line : summary.lines()) inForce.addElement(line);
        if (lastMessage.endsWith("reloading the packs…")) {
            say(lastMessage.substring(0, lastMessage.length() - "reloading the packs…".length()) + "the packs reloaded. "
                    + summary.text() + ".", stack.problems().isEmpty() ? "Arcwright.pass.foreground" : "Arcwright.error.foreground");
        }
        showFolders();
    }

    private void showFolders() {
        int keep = folderList.getSelectedIndex();
        folders.clear();
        for (String f : settings.teamPacks()) folders.addElement(f);
        if (keep >= 0 && keep < folders.size()) folderList.setSelectedIndex(keep);
        personalLabel.setText("Personal pack: " + personalPack.get());
        enableButtons();
    }

    private void enableButtons() {
        int i = folderList.getSelectedIndex();
        remove.setEnabled(i >= 0);
        up.setEnabled(i > 0);
        down.setEnabled(i >= 0 && i < folders.size() - 1);
    }

    private void choose() {
        JFileChooser chooser = new JFileChooser();
        chooser.setName("teamPackChooser");
        chooser.setDialogTitle("Choose a team pack folder (it holds a pack.json)");
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        chooser.setApproveButtonText("Use this pack");
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION && chooser.getSelectedFile() != null) {
            addFolder(chooser.getSelectedFile().toPath());
        }
    }

    /** Adds {@code folder} as the top team pack when it opens as a pack; says why not otherwise. */
    void addFolder(Path folder) {
        try {
            List<String> next = teamPacks.add(settings.teamPacks(), folder, personalPack.get());
            settings.setTeamPacks(next);
            say("Added " + folder.toAbsolutePath().normalize() + "; reloading the packs…", "Arcwright.pass.foreground");
            showFolders();
            folderList.setSelectedIndex(folders.size() - 1);
        } catch (InputProblem p) {
            say("Not added: " + p.getMessage(), "Arcwright.error.foreground");
        }
    }

    private void removeSelected() {
        int i = folderList.getSelectedIndex();
        if (i < 0) return;
        String gone = folders.get(i);
        settings.setTeamPacks(TeamPacks.remove(settings.teamPacks(), i));
        say("Removed " + gone + " from the team packs (the folder itself is untouched); reloading the packs…",
                "Arcwright.pass.foreground");
        showFolders();
    }

    private void moveSelected(int by) {
        int i = folderList.getSelectedIndex();
        if (i < 0) return;
        settings.setTeamPacks(TeamPacks.move(settings.teamPacks(), i, by));
        showFolders();
        folderList.setSelectedIndex(i + by);
        say("Moved; reloading the packs…", "Arcwright.pass.foreground");
    }

    private void say(String text, String colour) {
        lastMessage = text;
        message.show(text, colour);
    }

    /** What the page said last (tests). */
    String lastMessage() { return lastMessage; }

    /** The packs in force as listed (tests). */
    List<String> inForceLines() {
        return Collections.list(inForce.elements());
    }
}
