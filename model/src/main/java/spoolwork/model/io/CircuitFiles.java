package spoolwork.model.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

import spoolwork.model.Circuit;

/**
 * Loading and saving circuit files.
 *
 * <p>Saving is atomic: the new content goes to a temporary file in the same folder, is flushed and
 * fsynced, the previous file is kept as {@code <name>.bak}, and the temporary file is renamed over the
 * target. A failure at any point before the rename leaves the original file as it was.
 */
public final class CircuitFiles {
    /** The file name ending the editor proposes. */
    public static final String EXTENSION = ".spool.json";

    /** Where the bytes of a save go; replaced in tests to simulate a failing disk. */
    @FunctionalInterface
    interface ByteSink {
        void write(FileChannel channel, byte[] bytes) throws IOException;
    }

    private static final ByteSink CHANNEL_SINK = (ch, bytes) -> {
        ByteBuffer buf = ByteBuffer.wrap(bytes);
        while (buf.hasRemaining()) {
            ch.write(buf);
        }
    };

    private CircuitFiles() {
    }

    /**
     * Reads a circuit file.
     *
     * @throws CircuitFileException naming the file and the place in it
     */
    public static Circuit load(Path file) throws CircuitFileException {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > CircuitFormat.MAX_FILE_BYTES) {
                throw new CircuitFileException(name, "file of " + size + " bytes is larger than the "
                        + CircuitFormat.MAX_FILE_BYTES / (1024 * 1024) + " MiB a circuit may have");
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new CircuitFileException(name, "no such file");
        } catch (IOException e) {
            throw new CircuitFileException(name, "cannot read: " + e.getMessage(), e);
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw new CircuitFileException(name, "not UTF-8 text");
        }
        return CircuitFormat.read(text, name);
    }

    /** Saves atomically, keeping the previous version as {@code <name>.bak}. */
    public static void save(Circuit circuit, Path file) throws IOException {
        save(circuit, file, CHANNEL_SINK);
    }

    static void save(Circuit circuit, Path file, ByteSink sink) throws IOException {
        byte[] bytes = CircuitFormat.write(circuit).getBytes(StandardCharsets.UTF_8);
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        Path tmp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".tmp");
        boolean moved = false;
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                sink.write(ch, bytes);
                ch.force(true);
            }
            if (Files.exists(target)) {
                Path bak = target.resolveSibling(target.getFileName() + ".bak");
                Files.copy(target, bak, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
            syncDirectory(dir);
        } finally {
            if (!moved) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    private static void syncDirectory(Path dir) {
        // Makes the rename durable on POSIX file systems; not possible everywhere, and the data is already safe.
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // best effort only
        }
    }

    /** Writes the circuit's JSON to a stream (for export and the command line). */
    public static void write(Circuit circuit, OutputStream out) throws IOException {
        out.write(CircuitFormat.write(circuit).getBytes(StandardCharsets.UTF_8));
    }
}
