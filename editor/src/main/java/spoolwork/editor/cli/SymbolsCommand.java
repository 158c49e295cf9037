package spoolwork.editor.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
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
        Path dir = output.toAbsolutePath().getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            spec.commandLine().getErr().println("error: folder does not exist: " + dir);
            return 2;
        }
        Path target = TextFiles.writeAtomically(output, SymbolSheet.svg());
        spec.commandLine().getOut().println("wrote " + target);
        return 0;
    }
}
