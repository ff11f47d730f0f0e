package trailcross.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code trailcross} command line (picocli). Exit codes: 0 success, 1 a validation case failed,
 * 2 bad input (the message names the file, line, key or option),
 * 70 an internal error.
 */
@Command(name = "trailcross", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = {
            "Predicts meteoroid-stream encounters with the Earth: which trails of a parent comet or "
                + "asteroid the Earth meets in a year, when (UTC, solar longitude), how close (delta r), "
                + "from which radiant and how strongly.",
            "",
            "Forecasts are model estimates with stated uncertainties; operational decisions rest with "
                + "the responsible agencies' own assessments."
        },
        subcommands = {
            ForecastCommand.class, ReachCommand.class, ReturnsCommand.class, EphemerisCommand.class,
            RadiantsCommand.class, MoidCommand.class, ValidateCommand.class, BenchCommand.class,
            EjectCommand.class, CheckCommand.class, TimeCommand.class, CalibrateCommand.class, ApproachCommand.class,
            CommandLine.HelpCommand.class
        })
public final class Main implements Runnable {

    /** Exit code for bad input. */
    public static final int BAD_INPUT = 2;
    /** Exit code for an internal error. */
    public static final int INTERNAL = 70;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /**
     * Runs the command line.
     *
     * @param args the arguments
     */
    public static void main(String[] args) {
        System.exit(execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /**
     * Runs the command line with the given streams (used by the tests).
     *
     * @param args arguments
     * @param out standard output
     * @param err standard error
     * @return the exit code
     */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("trailcross: " + ex.getMessage().replace('\n', ' ')
                    + " (see 'trailcross " + subcommandName(c) + "--help')");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parsed) -> {
            Throwable t = ex instanceof UncheckedIOException u ? u.getCause() : ex;
            if (t instanceof IllegalArgumentException || t instanceof IOException) {
                c.getErr().println("trailcross: " + oneLine(t));
                return BAD_INPUT;
            }
            if (System.getenv("TRAILCROSS_DEBUG") != null) {
                t.printStackTrace(c.getErr());
            }
            c.getErr().println("trailcross: internal error: " + t.getClass().getSimpleName() + ": " + oneLine(t)
                    + " (set TRAILCROSS_DEBUG=1 for the stack trace)");
            return INTERNAL;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    private static String subcommandName(CommandLine c) {
        String name = c.getCommandName();
        return name.equals("trailcross") ? "" : name + " ";
    }

    private static String oneLine(Throwable t) {
        String m = t.getMessage();
        if (m == null || m.isBlank()) {
            m = t.getClass().getSimpleName();
        }
        if (t instanceof java.nio.file.NoSuchFileException) {
            m = m + ": no such file";
        }
        return m.replace('\n', ' ');
    }
}
