package org.arcwright.app.shell;

import java.awt.event.ActionEvent;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.Icon;
import javax.swing.KeyStroke;
import org.arcwright.app.model.Command;
import org.arcwright.app.model.CommandCatalog;

/**
 * Swing actions for every command of the catalog, so menus, toolbar buttons, shortcuts and the
 * command finder share one enabled state and one tooltip that says why a command cannot run.
 */
public final class CommandActions {
    private final CommandCatalog catalog;
    private final Map<String, Action> actions = new LinkedHashMap<>();

    public CommandActions(CommandCatalog catalog, Map<String, Icon> icons) {
        this.catalog = catalog;
        for (Command c : catalog.all()) actions.put(c.id(), new CommandAction(c, icons.get(c.id())));
        refresh();
    }

    public CommandCatalog catalog() { return catalog; }

    public Action get(String id) {
        Action a = actions.get(id);
        if (a == null) throw new IllegalArgumentException("no command " + id);
        return a;
    }

    /** Re-reads every command's enabled state and reason. */
    public void refresh() {
        for (Action a : actions.values()) ((CommandAction) a).refresh();
    }

    private static final class CommandAction extends AbstractAction {
        private static final long serialVersionUID = 1L;
        private final transient Command command;

        CommandAction(Command command, Icon icon) {
            super(command.title(), icon);
            this.command = command;
            if (command.shortcut() != null) putValue(ACCELERATOR_KEY, KeyStroke.getKeyStroke(command.shortcut()));
        }

        void refresh() {
            Optional<String> why = command.whyDisabled().get();
            setEnabled(why.isEmpty());
            String tip = command.title() + (command.shortcut() == null ? "" : "  (" + command.shortcutLabel() + ")");
            putValue(SHORT_DESCRIPTION, why.map(w -> command.title() + ": unavailable because " + w).orElse(tip));
        }

        @Override
        public void actionPerformed(ActionEvent e) {
            if (command.isEnabled()) command.action().run();
        }
    }
}
