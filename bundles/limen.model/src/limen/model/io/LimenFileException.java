package limen.model.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

import limen.model.validation.Problem;

/** A Limen file could not be loaded as the expected kind of document; carries the problems found. */
public class LimenFileException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient List<Problem> problems;

    /** @param problems what went wrong, at least one error */
    public LimenFileException(Path file, List<Problem> problems) {
        super(file + ": " + problems.stream().filter(Problem::isError).map(Problem::format)
                .collect(Collectors.joining("; ")));
        this.problems = List.copyOf(problems);
    }

    /** @return the problems found while loading */
    public List<Problem> problems() {
        return problems;
    }
}
