package limen.model.io;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import limen.model.LimenDocument;
import limen.model.validation.Problem;

/**
 * What loading one file gave: the document when it could be read without error, and every problem found
 * while reading (syntax errors with line and column, unknown content kept, schema version).
 *
 * @param file the file that was read
 * @param document the document, or null when loading failed
 * @param resource the resource holding the document (with element positions), or null when loading failed
 * @param problems the problems, errors first in file order
 * @param readable false when the file could not be read at all (missing, a folder, no permission)
 */
public record LoadResult(Path file, LimenDocument document, LimenResource resource, List<Problem> problems,
        boolean readable) {

    /** Copies the problem list. */
    public LoadResult {
        problems = List.copyOf(problems);
    }

    /** @return whether the document loaded without error */
    public boolean succeeded() {
        return document != null;
    }

    /** @return the document when it loaded */
    public Optional<LimenDocument> documentIfLoaded() {
        return Optional.ofNullable(document);
    }

    /** @return whether any problem is an error */
    public boolean hasErrors() {
        return problems.stream().anyMatch(Problem::isError);
    }
}
