package spoolwork.symbols;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

import spoolwork.model.Component;
import spoolwork.model.ComponentType;
import spoolwork.model.Point;

class TransformTest {
    private static final Point P = new Point(3, -1);

    private static void near(Point want, Point got) {
        assertEquals(want.x(), got.x(), 1e-9, "x of " + got);
        assertEquals(want.y(), got.y(), 1e-9, "y of " + got);
    }

    @Test
    void rotationIsClockwiseOnTheSheet() {
        // y points down, so a point to the right of the origin turns to below it.
        near(new Point(0, 1), new Transform(90, false, 0, 0).apply(new Point(1, 0)));
        near(new Point(-1, 0), new Transform(180, false, 0, 0).apply(new Point(1, 0)));
        near(new Point(0, -1), new Transform(270, false, 0, 0).apply(new Point(1, 0)));
        assertEquals(Direction.DOWN, new Transform(90, false, 0, 0).apply(Direction.RIGHT));
        assertEquals(Direction.LEFT, new Transform(90, false, 0, 0).apply(Direction.DOWN));
    }

    @Test
    void mirrorComesBeforeRotation() {
        // Mirrored first: (1, 0) → (−1, 0); then 90° clockwise → (0, −1).
        near(new Point(0, -1), new Transform(90, true, 0, 0).apply(new Point(1, 0)));
        assertEquals(Direction.UP, new Transform(90, true, 0, 0).apply(Direction.RIGHT));
    }

    @Test
    void inverseAndCompositionAgreeWithApplyingInTurn() {
        for (int r = 0; r < 360; r += 90) {
            for (boolean m : new boolean[] {false, true}) {
                Transform t = new Transform(r, m, 7, -4);
                near(P, t.inverse(t.apply(P)));
                for (int r2 = 0; r2 < 360; r2 += 90) {
                    for (boolean m2 : new boolean[] {false, true}) {
                        Transform u = new Transform(r2, m2, -2, 5);
                        near(u.apply(t.apply(P)), t.then(u).apply(P));
                    }
                }
            }
        }
        Transform quarter = new Transform(90, false, 0, 0);
        near(P, quarter.then(quarter).then(quarter).then(quarter).apply(P));
    }

    @Test
    void arcEndsFollowTheirPoints() {
        Shape.Arc a = new Shape.Arc(new Point(1, 2), 1.5, 20, 100, Stroke.SOLID);
        for (int r = 0; r < 360; r += 90) {
            for (boolean m : new boolean[] {false, true}) {
                Transform t = new Transform(r, m, 3, 1);
                Shape.Arc b = a.transformed(t);
                near(t.apply(a.start()), b.start());
                near(t.apply(a.end()), b.end());
                near(t.apply(a.pointAt(70)), b.pointAt(b.startDeg() + b.sweepDeg() / 2));
            }
        }
    }

    @Test
    void placedSymbolsKeepAnchorsOnGridOnOutlineTextUprightAndHitsRight() {
        for (ComponentType type : ComponentType.values()) {
            for (Map<String, String> v : SymbolLibrary.variants(type)) {
                Symbol local = SymbolLibrary.symbolFor(type, v, null);
                for (int r = 0; r < 360; r += 90) {
                    for (boolean m : new boolean[] {false, true}) {
                        Component c = Component.of("c", "X1", type, 12, -7).withRotation(r).withMirrored(m);
                        Transform t = Transform.of(c);
                        Symbol s = local.placed(c);
                        String where = s.key() + " rot " + r + (m ? " mirrored" : "");
                        for (int i = 0; i < s.anchors().size(); i++) {
                            Anchor a = s.anchors().get(i);
                            Anchor l = local.anchors().get(i);
                            assertEquals(l.port(), a.port());
                            near(t.apply(l.at()), a.at());
                            assertEquals(Math.rint(a.at().x()), a.at().x(), 1e-12, where);
                            assertEquals(Math.rint(a.at().y()), a.at().y(), 1e-12, where);
                            assertEquals(t.apply(l.outward()), a.outward(), where);
                            // Still on the outline, on the side it faces.
                            Box b = s.bounds();
                            double side = switch (a.outward()) {
                                case LEFT -> b.minX() - a.at().x();
                                case RIGHT -> b.maxX() - a.at().x();
                                case UP -> b.minY() - a.at().y();
                                case DOWN -> b.maxY() - a.at().y();
                            };
                            assertEquals(0, side, 1e-9, where + " " + a);
                            assertTrue(SymbolLibraryTest.lineEndsAt(s, a.at(), a.outward()), where + " " + a.port());
                        }
                        for (int i = 0; i < s.shapes().size(); i++) {
                            if (local.shapes().get(i) instanceof Shape.Text lt) {
                                Shape.Text pt = (Shape.Text) s.shapes().get(i);
                                assertEquals(lt.text(), pt.text());
                                assertEquals(lt.size(), pt.size());
                                assertEquals(lt.anchor(), pt.anchor());
                                near(t.apply(lt.at()), pt.at());
                            }
                        }
                        Point inside = local.bounds().centre();
                        assertTrue(s.hits(t.apply(inside)), where + " hit at its middle");
                        Point outside = new Point(local.bounds().maxX() + 0.5, local.bounds().maxY() + 0.5);
                        assertEquals(local.hits(outside), s.hits(t.apply(outside)), where);
                        near(inside, t.inverse(t.apply(inside)));
                    }
                }
            }
        }
    }
}
