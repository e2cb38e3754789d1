package org.arcwright.app.decide;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.Objects;
import javax.swing.JComponent;

/**
 * A feature control frame image at its own size, or scaled down with its proportions kept when the
 * card is narrower: a cut-off frame would hide the datum cells, which are read last.
 */
final class FramePreview extends JComponent {
    private static final long serialVersionUID = 1L;
    private final transient BufferedImage image;

    FramePreview(BufferedImage image) {
        this.image = Objects.requireNonNull(image, "image");
        setMinimumSize(new Dimension(10, 4));
        setMaximumSize(new Dimension(image.getWidth(), image.getHeight()));
    }

    /** Full size until laid out narrower; then the height that keeps the proportions at that width. */
    @Override
    public Dimension getPreferredSize() {
        return new Dimension(image.getWidth(), heightAt(getWidth()));
    }

    private int heightAt(int width) {
        if (width <= 0 || width >= image.getWidth()) return image.getHeight();
        return (int) Math.ceil(image.getHeight() * (double) width / image.getWidth());
    }

    @Override
    protected void paintComponent(Graphics g) {
        double s = Math.min(1, Math.min(getWidth() / (double) image.getWidth(), getHeight() / (double) image.getHeight()));
        if (s <= 0) return;
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BICUBIC);
            g2.drawImage(image, 0, 0, (int) Math.round(image.getWidth() * s), (int) Math.round(image.getHeight() * s), null);
        } finally {
            g2.dispose();
        }
    }
}
