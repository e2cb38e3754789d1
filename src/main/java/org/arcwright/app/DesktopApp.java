package org.arcwright.app;

import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;

/** Starts the desktop window. */
public final class DesktopApp {
    private DesktopApp() {}

    public static void launch(String[] args) {
        SwingUtilities.invokeLater(() -> {
            com.formdev.flatlaf.FlatLightLaf.setup();
            JFrame f = new JFrame("Arcwright");
            f.setDefaultCloseOperation(WindowConstants.EXIT_ON_CLOSE);
            f.add(new JLabel("Arcwright", JLabel.CENTER));
            f.setSize(1200, 800);
            f.setLocationRelativeTo(null);
            f.setVisible(true);
        });
    }
}
