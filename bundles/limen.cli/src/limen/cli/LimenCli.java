package limen.cli;

import java.io.PrintWriter;

import limen.core.About;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.IVersionProvider;

/**
 * The headless entry point: {@code ./limen <command> ...}. Runs on a plain class path (no OSGi) so that it
 * starts fast. Exit codes for every command: 0 success, 1 refused or failed work, 2 usage error or unreadable
 * input.
 */
@Command(name = "limen",
        mixinStandardHelpOptions = true,
        versionProvider = LimenCli.Version.class,
        description = {"Limen: adaptive psychoacoustic batteries for hearing-science labs (headless commands).",
                "Without a command word, ./limen starts the workbench.", ""},
        footer = {"", "Caution: " + About.RESEARCH_CAUTION},
        subcommands = {
                CommandLine.HelpCommand.class,
                CheckCommand.class,
                FitCommand.class,
                RefitCommand.class,
                RenderCommand.class,
                SimulateCommand.class,
                SelftestCommand.class,
                RunCommand.class,
        })
public final class LimenCli implements Runnable {

    /** Exit code for refused or failed work. */
    public static final int EXIT_FAILED = 1;
    /** Exit code for a usage error or unreadable input. */
    public static final int EXIT_USAGE = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        // no command word on the headless path: show the usage and fail as a usage error
        spec.commandLine().usage(spec.commandLine().getErr());
        throw new CommandLine.ParameterException(spec.commandLine(), "a command word is required");
    }

    /** Builds the command line with Limen's conventions (used by {@link #main} and by tests). */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new LimenCli());
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler((ex, line, parse) -> {
            line.getErr().println("limen " + line.getCommandName() + ": " + messageOf(ex));
            return ex instanceof IllegalArgumentException ? EXIT_USAGE : EXIT_FAILED;
        });
        return cl;
    }

    /** Runs one command line and returns its exit code. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        return commandLine(out, err).execute(args);
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        int code = execute(out, err, args);
        out.flush();
        err.flush();
        System.exit(code);
    }

    private static String messageOf(Throwable ex) {
        String message = ex.getMessage();
        return message == null || message.isBlank() ? ex.toString() : message;
    }

    /** {@code --version}: version, build date, Java version and the research-use caution. */
    public static final class Version implements IVersionProvider {
        @Override
        public String[] getVersion() {
            return About.current().versionText().split("\n");
        }
    }
}
