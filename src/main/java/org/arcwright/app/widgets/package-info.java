/**
 * The desktop's own widgets, shared by every panel: the look (themes, icons, drawing colours),
 * wrapping labels, cards, the cautions box, the notice strip, lazily built tabs and scrollable
 * panels.
 *
 * <p>May import: Swing/AWT, FlatLaf, MigLayout, {@code app.model} (view-model values such as the theme choice), {@code render} (drawing palettes) and the JDK. Must
 * not import the window ({@code app.shell}) nor any panel package: panels depend on widgets, the
 * window depends on panels.
 */
package org.arcwright.app.widgets;
