package spoolwork.model.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import spoolwork.model.Circuit;
import spoolwork.model.RandomCircuits;

class RoundTripTest {

    @Test
    void thousandRandomCircuitsSurviveSaveAndLoad(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("c.spool.json");
        for (long seed = 0; seed < 1000; seed++) {
            Circuit c = RandomCircuits.generate(seed);
            CircuitFiles.save(c, file);
            Circuit back = CircuitFiles.load(file);
            assertEquals(c, back, "seed " + seed);
            // Writing is deterministic, so an unchanged circuit saves to the same bytes (diff-friendly).
            assertEquals(CircuitFormat.write(c), CircuitFormat.write(back), "seed " + seed);
        }
    }

    @Test
    void saveKeepsThePreviousVersionAsBak(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("press.spool.json");
        Circuit first = RandomCircuits.generate(1);
        Circuit second = RandomCircuits.generate(2);
        CircuitFiles.save(first, file);
        CircuitFiles.save(second, file);
        assertEquals(second, CircuitFiles.load(file));
        assertEquals(first, CircuitFiles.load(dir.resolve("press.spool.json.bak")));
        try (var s = Files.list(dir)) {
            assertEquals(2, s.count(), "no temporary file is left behind");
        }
    }
}
