package limen.model.testsupport;

import java.nio.file.Files;
import java.nio.file.Path;

/** Where the repository's files are when tests run (surefire in the bundle folder, or the quick-test script). */
public final class TestPaths {

    private TestPaths() {
    }

    /** @return the repository root: the {@code limen.root} property, else the first parent holding examples/ */
    public static Path root() {
        String property = System.getProperty("limen.root");
        if (property != null && Files.isDirectory(Path.of(property, "examples"))) {
            return Path.of(property).toAbsolutePath().normalize();
        }
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("examples")) && Files.isDirectory(p.resolve("bundles/limen.model"))) {
                return p;
            }
        }
        throw new IllegalStateException("cannot find the repository root from " + Path.of("").toAbsolutePath());
    }

    /** @return the demo lab folder */
    public static Path examples() {
        return root().resolve("examples");
    }

    /** @return the broken fixtures, one per problem code */
    public static Path fixtures() {
        return root().resolve("bundles/limen.model/src-test/limen/model/fixtures");
    }
}
