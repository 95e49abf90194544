package limen.core.extension;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The registry on a plain class path (this test's {@code META-INF/services/limen.core.extension.ExtensionsTest$Greeter}
 * names two providers) and fed by services as the workbench's binder does.
 */
class ExtensionsTest {

    /** A kind of extension for this test. */
    public interface Greeter {
        String id();
    }

    /** Listed second in the services file; sorts first by class name. */
    public static final class Alpha implements Greeter {
        @Override
        public String id() {
            return "alpha";
        }
    }

    /** Listed first in the services file. */
    public static final class Beta implements Greeter {
        @Override
        public String id() {
            return "beta";
        }
    }

    /** Claims the same id as Beta; only bound by hand. */
    static final class FakeBeta implements Greeter {
        @Override
        public String id() {
            return "beta";
        }
    }

    /** A kind nobody provides. */
    public interface Nobody {
    }

    @Test
    void theClassPathProvidersAreFoundInClassNameOrder() {
        List<Greeter> all = Extensions.all(Greeter.class);
        assertEquals(List.of(Alpha.class, Beta.class), all.stream().map(Object::getClass).toList());
        assertTrue(Extensions.find(Greeter.class, "beta", Greeter::id).orElseThrow() instanceof Beta);
        assertTrue(Extensions.find(Greeter.class, "gamma", Greeter::id).isEmpty());
        assertEquals("alpha, beta", Extensions.ids(Greeter.class, Greeter::id));
        assertEquals("(none)", Extensions.ids(Nobody.class, Object::toString));
    }

    @Test
    void servicesReplaceTheClassPathAndTwoProvidersOfOneIdAreRefused() {
        FakeBeta fake = new FakeBeta();
        Beta beta = new Beta();
        try {
            Extensions.bind(Greeter.class, beta);
            Extensions.useServices();
            assertEquals(List.of(beta), Extensions.all(Greeter.class), "only what is bound counts");
            Extensions.bind(Greeter.class, fake);
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> Extensions.find(Greeter.class, "beta", Greeter::id));
            assertTrue(e.getMessage().contains("'beta'") && e.getMessage().contains(FakeBeta.class.getName())
                    && e.getMessage().contains(Beta.class.getName()), e.getMessage());
            Extensions.unbind(Greeter.class, fake);
            assertEquals(List.of(beta), Extensions.all(Greeter.class));
        } finally {
            Extensions.unbind(Greeter.class, beta);
            Extensions.useClassPath();
        }
        assertEquals(2, Extensions.all(Greeter.class).size());
    }
}
