package org.arcwright.bench;

import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;

/**
 * The baseline for the start-up harness: a bare Swing frame with one label, no look and feel of
 * its own, reporting when it is usable exactly as the Arcwright window does.
 */
public final class BareFrame {
    private BareFrame() {}

    public static void main(String[] args) {
        boolean exit = "exit".equals(System.getProperty("arcwright.startupProbe"));
        SwingUtilities.invokeLater(() -> {
            JFrame f = new JFrame("Bare frame");
            f.setDefaultCloseOperation(WindowConstants.EXIT_ON_CLOSE);
            f.add(new JLabel("Bare frame", JLabel.CENTER));
            f.setSize(1400, 860);
            f.addWindowListener(new java.awt.event.WindowAdapter() {
                @Override
                public void windowOpened(java.awt.event.WindowEvent e) {
                    SwingUtilities.invokeLater(() -> {
                        System.out.println("arcwright-window-usable cpu=" + ProcessHandle.current().info().totalCpuDuration()
                                .map(java.time.Duration::toMillis).orElse(-1L));
                        System.out.flush();
                        if (exit) System.exit(0);
                    });
                }
            });
            f.setVisible(true);
        });
    }
}
