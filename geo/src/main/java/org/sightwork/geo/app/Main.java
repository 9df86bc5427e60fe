package org.sightwork.geo.app;

import java.io.PrintWriter;
import java.util.ServiceLoader;
import java.util.concurrent.Callable;
import org.sightwork.geo.spi.CommandProvider;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code sightwork} command: with no sub-command it opens the chart window; every sub-command
 * comes from a {@link CommandProvider} found on the class path.
 *
 * <p>Exit codes: 0 done, 2 usage error (bad option or value), 1 a computation that failed. Messages
 * go to standard error, results to standard output.
 */
@Command(name = "sightwork",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = {"Celestial navigation on an open chart: almanac, sight reduction, fixes,",
                "passage reconciliation, sight planning and training drills.",
                "With no command, opens the chart window."},
        footer = {"", Caution.TEXT})
public final class Main implements Callable<Integer> {

    /** Exit code of a computation that could not be done. */
    public static final int EXIT_FAILED = 1;
    /** Exit code of a usage error. */
    public static final int EXIT_USAGE = 2;

    @Override
    public Integer call() {
        return ChartWindowLauncher.open();
    }

    /**
     * Runs the command line.
     *
     * @param args the arguments
     */
    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /**
     * Runs the command line with the given streams (for tests).
     *
     * @param args the arguments
     * @param out standard output
     * @param err standard error
     * @return the exit code
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        return commandLine(out, err).execute(args);
    }

    /**
     * Builds the command line with every plugin's commands.
     *
     * @param out standard output
     * @param err standard error
     * @return the command line, ready to execute
     */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cli = new CommandLine(new Main());
        for (CommandProvider provider : ServiceLoader.load(CommandProvider.class)) {
            for (Object command : provider.commands()) {
                cli.addSubcommand(command);
            }
        }
        cli.setOut(out);
        cli.setErr(err);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.setExecutionExceptionHandler(Main::reportFailure);
        return cli;
    }

    /** Prints a failed computation in one line, without a stack trace unless asked for. */
    private static int reportFailure(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        String message = ex.getMessage() == null ? ex.getClass().getSimpleName() : ex.getMessage();
        err.println("sightwork " + cl.getCommandName() + ": " + message);
        if (System.getenv("SIGHTWORK_DEBUG") != null) {
            ex.printStackTrace(err);
        }
        err.flush();
        if (ex instanceof IllegalArgumentException) {
            return EXIT_USAGE;
        }
        return EXIT_FAILED;
    }

    /** The version, from the jar manifest when there is one. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"sightwork " + (v == null ? "development build" : v)};
        }
    }
}
