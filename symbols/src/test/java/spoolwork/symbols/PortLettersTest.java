package spoolwork.symbols;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import spoolwork.model.ComponentType;
import spoolwork.model.Point;

class PortLettersTest {

    @Test
    void everyFluidPortHasItsLetterJustInsideItsAnchorAndTheShaftNone() {
        Symbol pump = SymbolLibrary.symbolFor(ComponentType.FIXED_PUMP, Map.of(), null);
        List<Shape.Text> letters = PortLetters.of(pump);
        assertEquals(List.of("P", "S"), letters.stream().map(Shape.Text::text).sorted().toList());
        for (Shape.Text t : letters) {
            Anchor a = pump.anchor(t.text()).orElseThrow();
            double d = Math.hypot(t.at().x() - a.at().x(), t.at().y() - a.at().y());
            assertTrue(d < 1.0, t.text() + " is " + d + " grid units from its anchor");
            double ahead = (t.at().x() - a.at().x()) * a.outward().dx() + (t.at().y() - a.at().y()) * a.outward().dy();
            assertTrue(ahead < 0, t.text() + " sits inside the anchor, not out on the line");
            assertEquals(PortLetters.SIZE, t.size());
        }
    }

    @Test
    void aLetterBesideAVerticalLineStandsToItsRightAndBesideAHorizontalOneAboveIt() {
        Shape.Text below = PortLetters.of(new Anchor("A", new Point(4, 6), Direction.DOWN));
        assertEquals(Shape.TextAnchor.START, below.anchor());
        assertTrue(below.at().x() > 4 && below.at().y() < 6, below.toString());
        Shape.Text left = PortLetters.of(new Anchor("T", new Point(0, 2), Direction.LEFT));
        assertEquals(Shape.TextAnchor.MIDDLE, left.anchor());
        assertTrue(left.at().x() > 0 && left.at().y() < 2, left.toString());
    }
}
