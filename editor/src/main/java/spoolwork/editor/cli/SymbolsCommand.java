package spoolwork.editor.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import spoolwork.symbols.SymbolSheet;

/** Writes the review sheet of every symbol, with names and port letters, as SVG. Headless. */
@Command(name = "symbols", mixinStandardHelpOptions = true,
        description = "Write every component symbol in every variant, with its name and port letters, to an SVG sheet.")
public final class SymbolsCommand implements Callable<Integer> {

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE", description = "SVG file to write")
    private Path output;

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        Path target = output.toAbsolutePath();
        Path dir = target.getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            spec.commandLine().getErr().println("error: folder does not exist: " + dir);
            return 2;
        }
        // Write beside the target and move into place, so a failed write never leaves half a file.
        Path tmp = target.resolveSibling("." + target.getFileName() + ".part");
        try {
            Files.writeString(tmp, SymbolSheet.svg(), StandardCharsets.UTF_8);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
        spec.commandLine().getOut().println("wrote " + target);
        return 0;
    }
}
