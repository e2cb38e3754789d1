package org.arcwright.bench;

import java.awt.Graphics;
import java.time.Duration;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JLayeredPane;
import javax.swing.SwingUtilities;
import javax.swing.WindowConstants;

/**
 * The baseline for the start-up harness: a bare Swing frame with one label, no look and feel of
 * its own, reporting when its first frame is painted exactly as the Arcwright window does (a
 * one-pixel probe on the top layer), and ending the process then when asked.
 */
public final class BareFrame {
    private BareFrame() {}

    public static void main(String[] args) {
        boolean exit = "exit".equals(System.getProperty(StartupProbe.PROBE_PROPERTY));
        SwingUtilities.invokeLater(() -> {
            JFrame f = new JFrame("Bare frame");
            f.setDefaultCloseOperation(WindowConstants.EXIT_ON_CLOSE);
            f.add(new JLabel("Bare frame", JLabel.CENTER));
            f.setSize(1400, 860);
            JComponent probe = new JComponent() {
                private static final long serialVersionUID = 1L;
                private boolean painted;

                @Override
                protected void paintComponent(Graphics g) {
                    if (painted || !f.isShowing()) return;
                    painted = true;
                    String cpu = " cpu=" + ProcessHandle.current().info().totalCpuDuration()
                            .map(Duration::toMillis).orElse(-1L);
                    System.out.println(StartupProbe.USABLE_MARKER + cpu);
                    System.out.println(StartupProbe.COMPLETE_MARKER + cpu);
                    System.out.flush();
                    if (exit) SwingUtilities.invokeLater(() -> System.exit(0));
                }
            };
            probe.setBounds(0, 0, 1, 1);
            f.getLayeredPane().add(probe, JLayeredPane.DRAG_LAYER);
            f.setVisible(true);
        });
    }
}
