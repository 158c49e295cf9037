package spoolwork.editor.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writing command output files so that a failed write never leaves half a file. */
final class TextFiles {
    private TextFiles() {
    }

    /**
     * Writes the text beside the target and moves it into place.
     *
     * @throws java.nio.file.NoSuchFileException when the folder does not exist
     */
    static Path writeAtomically(Path output, String text) throws IOException {
        Path target = output.toAbsolutePath();
        Path dir = target.getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new java.nio.file.NoSuchFileException(dir.toString(), null, "folder does not exist");
        }
        Path tmp = target.resolveSibling("." + target.getFileName() + ".part");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
        return target;
    }
}
