package limen.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import limen.model.io.DocumentChecker;
import limen.model.validation.Problem;
import limen.model.validation.Severity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code ./limen check FILE...}: loads and validates batteries, calibrations and session headers and prints one
 * line per problem, {@code FILE:LINE: error|warning: CODE: message}. See {@link DocumentChecker}.
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Check batteries (*.battery), calibrations (*.calibration) and session headers (*.session).",
                "Prints each problem as FILE:LINE: error|warning: CODE: message (codes LMnnnn are stable).",
                "A battery is checked against the calibration file it names, or against --calibration."},
        footer = {"", "Exit codes: 0 no errors (warnings allowed), 1 errors found, 2 usage error or unreadable file."})
public final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Files to check.")
    List<Path> files;

    @Option(names = "--calibration", paramLabel = "FILE",
            description = "Check every battery against this calibration instead of the one it names.")
    Path calibration;

    @Override
    public Integer call() {
        DocumentChecker.Report report = DocumentChecker.check(files, calibration);
        PrintWriter out = spec.commandLine().getOut();
        for (Problem problem : report.problems()) {
            out.println(problem.format());
        }
        out.flush();
        long errors = report.count(Severity.ERROR);
        long warnings = report.count(Severity.WARNING);
        PrintWriter err = spec.commandLine().getErr();
        err.println("limen check: " + files.size() + (files.size() == 1 ? " file, " : " files, ") + errors
                + (errors == 1 ? " error, " : " errors, ") + warnings + (warnings == 1 ? " warning" : " warnings"));
        err.flush();
        if (report.unreadable()) {
            return LimenCli.EXIT_USAGE;
        }
        return errors > 0 ? LimenCli.EXIT_FAILED : 0;
    }
}
