package spoolwork.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/** model, symbols and solver must stay free of JavaFX so they run headless and in any front end. */
class LayeringTest {
    // Built from parts so that this file does not itself hold the text it searches for.
    private static final String FX_IMPORT = "import " + "javafx.";

    @Test
    void noJavaFxOutsideTheEditor() throws IOException {
        Path root = Path.of("").toAbsolutePath().getParent();
        List<String> offenders;
        try (Stream<Path> files = Stream.of("model", "symbols", "solver")
                .map(m -> root.resolve(m).resolve("src"))
                .filter(Files::isDirectory)
                .flatMap(LayeringTest::walk)) {
            offenders = files.filter(p -> p.toString().endsWith(".java"))
                    .filter(LayeringTest::importsJavaFx)
                    .map(p -> root.relativize(p).toString())
                    .collect(Collectors.toList());
        }
        assertEquals(List.of(), offenders);
    }

    private static Stream<Path> walk(Path p) {
        try {
            return Files.walk(p);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static boolean importsJavaFx(Path p) {
        try {
            return Files.readAllLines(p).stream().anyMatch(l -> l.strip().startsWith(FX_IMPORT));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
