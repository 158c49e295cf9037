package spoolwork.editor.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import spoolwork.model.Circuit;
import spoolwork.model.OperatingState;
import spoolwork.model.io.CircuitFileException;
import spoolwork.model.io.CircuitFiles;
import spoolwork.symbols.CircuitDrawing;
import spoolwork.symbols.SvgWriter;

/** Draws a circuit file as an SVG drawing, with its valves in the positions of one operating state. Headless. */
@Command(name = "render", mixinStandardHelpOptions = true,
        description = "Draw a circuit as SVG, valves shown in the positions of an operating state.")
public final class RenderCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FILE", description = "circuit file (.spool.json)")
    private Path file;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "SVG", description = "SVG file to write")
    private Path output;

    @Option(names = "--state", paramLabel = "NAME",
            description = "operating state whose spool positions are drawn (default: valves at rest)")
    private String stateName;

    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        Circuit circuit;
        try {
            circuit = CircuitFiles.load(file);
        } catch (CircuitFileException e) {
            spec.commandLine().getErr().println("error: " + e.getMessage());
            return 2;
        }
        OperatingState state = null;
        if (stateName != null) {
            state = circuit.state(stateName).orElse(null);
            if (state == null) {
                spec.commandLine().getErr().println("error: " + file.getFileName() + " has no operating state '"
                        + stateName + "'; it has " + circuit.states().stream().map(OperatingState::name).toList());
                return 2;
            }
        }
        Path dir = output.toAbsolutePath().getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            spec.commandLine().getErr().println("error: folder does not exist: " + dir);
            return 2;
        }
        Path target = TextFiles.writeAtomically(output, SvgWriter.circuit(CircuitDrawing.of(circuit, state)));
        spec.commandLine().getOut().println("wrote " + target);
        return 0;
    }
}
