package spoolwork.editor.cli;

import java.io.PrintWriter;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The headless command line. Sub-commands run without a display and never load JavaFX. Exit codes:
 * 0 done, 1 the work was done but the circuit did not solve (or a check failed), 2 bad arguments or an
 * unreadable file.
 */
@Command(name = "spoolwork", mixinStandardHelpOptions = true, version = "Spoolwork 0.1",
        description = "Draw hydraulic circuits and calculate them. With no command, opens the editor.",
        subcommands = {CommandLine.HelpCommand.class, SolveCommand.class, RenderCommand.class,
                SymbolsCommand.class})
public final class Cli implements Runnable {

    @Override
    public void run() {
        new CommandLine(this).usage(System.out);
    }

    /** True when the arguments ask for a headless command (or for help) rather than the editor. */
    public static boolean isSubcommand(String[] args) {
        if (args.length == 0) {
            return false;
        }
        String first = args[0];
        return first.startsWith("-") || commandLine().getSubcommands().containsKey(first);
    }

    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Cli());
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            cmd.getErr().println("error: " + ex.getMessage());
            return 2;
        });
        return cl;
    }

    /** Runs the arguments and returns the exit code. */
    public static int run(String[] args) {
        return commandLine().execute(args);
    }

    /** Runs with the given output streams, for tests. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine();
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }
}
