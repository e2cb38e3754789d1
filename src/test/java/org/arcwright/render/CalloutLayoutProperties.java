package org.arcwright.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * Any profile or composite frame lays out cleanly: cells do not overlap, every label sits inside
 * a cell, and everything drawn lies inside the drawing's bounds. A combination the drawing standard
 * refuses is refused with a located error instead.
 */
class CalloutLayoutProperties {
    private final DrawingFont font = DrawingFont.bundled();
    private final CalloutLayout layout = new CalloutLayout(font);

    @Property(tries = 200, seed = "20261201")
    void framesLayOutWithoutOverlapsAndWithTextInsideCells(@ForAll("callouts") Callout c, @ForAll DrawingStyle style,
                                                           @ForAll Units units) {
        if (style == DrawingStyle.ISO && c instanceof Callout.Profile p && p.outward() != null && p.dynamic()) {
            // ISO 1101: a zone has a stated offset (UZ) or an unspecified one (OZ), never both; refused, not drawn
            assertThatThrownBy(() -> layout.layout(c, style, units)).isInstanceOf(InputProblem.class);
            return;
        }
        CalloutDrawing d = layout.layout(c, style, units);
        List<CalloutDrawing.Cell> frameCells = d.cells().stream().filter(x -> x.role() != CalloutDrawing.Role.TEXT).toList();
        for (int i = 0; i < frameCells.size(); i++) {
            for (int j = i + 1; j < frameCells.size(); j++) {
                Rectangle2D overlap = frameCells.get(i).bounds().createIntersection(frameCells.get(j).bounds());
                assertThat(overlap.getWidth() <= 1e-9 || overlap.getHeight() <= 1e-9).as("cells %d and %d overlap", i, j).isTrue();
            }
        }
        Rectangle2D page = new Rectangle2D.Double(0, 0, d.width(), d.height());
        for (CalloutDrawing.Mark m : d.marks()) {
            Rectangle2D b;
            if (m instanceof CalloutDrawing.Label t) {
                b = font.inkBounds(t.text(), t.size(), t.x(), t.baseline());
                Rectangle2D ink = b;
                assertThat(d.cells()).as("label '%s' inside a cell", t.text())
                        .anyMatch(cell -> grown(cell.bounds(), 0.2).contains(ink));
            } else if (m instanceof CalloutDrawing.Line l) {
                b = l.shape().getBounds2D();
            } else {
                b = ((CalloutDrawing.Solid) m).shape().getBounds2D();
            }
            // corners, not Rectangle2D.contains: a straight line has an empty box, which contains() rejects
            Rectangle2D g = grown(page, 0.01);
            assertThat(b.getMinX() >= g.getMinX() && b.getMaxX() <= g.getMaxX() && b.getMinY() >= g.getMinY()
                    && b.getMaxY() <= g.getMaxY()).as("mark %s inside the drawing %s", b, page).isTrue();
        }
    }

    private static Rectangle2D grown(Rectangle2D r, double by) {
        return new Rectangle2D.Double(r.getX() - by, r.getY() - by, r.getWidth() + 2 * by, r.getHeight() + 2 * by);
    }

    @Provide
    Arbitrary<Callout> callouts() {
        Arbitrary<Double> zone = Arbitraries.doubles().between(0.001, 9.0).ofScale(3).filter(z -> z > 0);
        Arbitrary<List<DatumReference>> datums = Arbitraries.integers().between(0, 3).flatMap(n ->
                Arbitraries.of("", "(M)", "(L)").list().ofSize(n).map(mods -> {
                    List<DatumReference> out = new ArrayList<>();
                    for (int i = 0; i < mods.size(); i++) out.add(DatumReference.parse((char) ('A' + i) + mods.get(i)));
                    return out;
                }));
        Arbitrary<Extent> extent = Arbitraries.of(Extent.THIS_RADIUS, Extent.WITH_ADJACENT, Extent.ALL_AROUND,
                new Extent(Extent.Kind.ALL_OVER, null, null), Extent.between("J", "K"), Extent.between("AA", "BB"));
        Arbitrary<Callout> profile = Combinators.combine(zone, Arbitraries.doubles().between(0, 1), datums,
                Arbitraries.of(true, false), Arbitraries.of(true, false), extent)
                .as((z, f, d, unequal, dyn, e) -> new Callout.Profile(z, unequal ? z * f : null, d, dyn, e));
        Arbitrary<Callout> composite = Combinators.combine(zone, datums, Arbitraries.integers().between(2, 3), extent)
                .as((z, d, tiers, e) -> {
                    List<ProfileTier> t = new ArrayList<>();
                    for (int i = 0; i < tiers; i++) {
                        t.add(new ProfileTier(z / Math.pow(4, i), d.subList(0, Math.max(0, d.size() - i))));
                    }
                    return new Callout.CompositeProfile(t, e);
                });
        return Arbitraries.oneOf(profile, composite);
    }
}
