package spoolwork.model.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import spoolwork.model.Circuit;
import spoolwork.model.RandomCircuits;

class AtomicSaveTest {

    @Test
    void aFailureMidWriteLeavesTheOriginalIntact(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("winch.spool.json");
        Circuit original = RandomCircuits.generate(7);
        CircuitFiles.save(original, file);
        byte[] before = Files.readAllBytes(file);

        Circuit changed = RandomCircuits.generate(8);
        IOException boom = assertThrows(IOException.class, () -> CircuitFiles.save(changed, file, (ch, bytes) -> {
            ch.write(ByteBuffer.wrap(bytes, 0, bytes.length / 2));
            throw new IOException("disk full");
        }));
        assertEquals("disk full", boom.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(original, CircuitFiles.load(file));
        try (var s = Files.list(dir)) {
            assertEquals(1, s.count(), "the temporary file is removed and no .bak is made");
        }
    }

    @Test
    void saveIntoAMissingFolderFailsWithoutCreatingAnything(@TempDir Path dir) {
        Path file = dir.resolve("no-such-folder").resolve("x.spool.json");
        assertThrows(IOException.class, () -> CircuitFiles.save(RandomCircuits.generate(3), file));
        assertEquals(false, Files.exists(file.getParent()));
    }
}
