package limen.core.extension;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Function;

/**
 * The one place that answers "which providers of kind K are installed": procedures
 * ({@code limen.procedure.ProcedureKind}), psychometric families ({@code limen.psychometric.Sigmoid}),
 * stimulus designs ({@code limen.signal.StimulusDesign}) and the model's check of contributed settings
 * ({@code limen.model.validation.ContributionCheck}). Limen's own built-in methods, families and designs are
 * found here in exactly the same way as a lab's.
 * <p>
 * Two sources feed it, with the <em>same</em> provider classes:
 * <ul>
 * <li><b>Plain class path</b> (the headless commands, plain JUnit tests): {@link ServiceLoader} reads the
 * {@code META-INF/services/<kind>} files of every jar on the class path of the kind's class loader. A jar is
 * installed by putting it on the class path (the launcher adds {@code extensions/*.jar}).</li>
 * <li><b>OSGi</b> (the workbench): each provider is a Declarative Services component
 * ({@code OSGI-INF/*.xml}) that offers itself as a service of its kind; one component of {@code limen.session}
 * binds all of them and hands them to {@link #bind}, then switches this registry to the services with
 * {@link #useServices()}. Bundles are installed and removed while the workbench runs; {@link #unbind} follows.
 * ServiceLoader is not used under OSGi, because a bundle's class loader sees no other bundle's
 * {@code META-INF/services}.</li>
 * </ul>
 * Why this and not the Eclipse extension registry: the headless commands must run without OSGi, and
 * ServiceLoader and DS both instantiate a provider class through its public no-argument constructor, so one
 * class serves both worlds without a line of OSGi API in the core bundles (DS 1.3 bind methods may take the
 * service type alone).
 * <p>
 * Providers are listed in a fixed order (by class name), so two runs of a battery see the same ones. The
 * registry is process-wide for the same reason the installed bundles are: it describes what is installed in
 * this process, not a setting of any computation.
 */
public final class Extensions {

    private static final Map<Class<?>, List<?>> CLASSPATH = new ConcurrentHashMap<>();
    private static final Map<Class<?>, List<Object>> SERVICES = new ConcurrentHashMap<>();
    private static volatile boolean services;

    private Extensions() {
    }

    /**
     * @param kind the provider interface
     * @return every installed provider of that kind, ordered by class name (unmodifiable)
     * @throws IllegalStateException when a class-path provider named in a services file cannot be loaded or
     *         created (the message names it)
     */
    public static <T> List<T> all(Class<T> kind) {
        List<?> found = services ? SERVICES.getOrDefault(kind, List.of()) : CLASSPATH.computeIfAbsent(kind, Extensions::load);
        List<T> typed = new ArrayList<>(found.size());
        for (Object o : found) {
            typed.add(kind.cast(o));
        }
        typed.sort(Comparator.comparing(o -> o.getClass().getName()));
        return List.copyOf(typed);
    }

    /**
     * @param kind the provider interface
     * @param id the wanted identifier
     * @param idOf how a provider of this kind names itself
     * @return the one provider whose identifier equals {@code id}, or empty when none is installed
     * @throws IllegalStateException when two installed providers claim the same identifier (both named)
     */
    public static <T> Optional<T> find(Class<T> kind, String id, Function<? super T, String> idOf) {
        T match = null;
        for (T provider : all(kind)) {
            if (idOf.apply(provider).equals(id)) {
                if (match != null) {
                    throw new IllegalStateException("two installed extensions provide " + kind.getSimpleName() + " '" + id
                            + "': " + match.getClass().getName() + " and " + provider.getClass().getName());
                }
                match = provider;
            }
        }
        return Optional.ofNullable(match);
    }

    /** @return the identifiers of the installed providers of a kind, for messages (e.g. {@code "a, b, c"}) */
    public static <T> String ids(Class<T> kind, Function<? super T, String> idOf) {
        List<String> names = new ArrayList<>();
        for (T provider : all(kind)) {
            names.add(idOf.apply(provider));
        }
        return names.isEmpty() ? "(none)" : String.join(", ", names);
    }

    /**
     * Adds a provider announced by OSGi Declarative Services (called by the binding component only).
     *
     * @param kind its kind
     * @param provider the service object
     */
    public static void bind(Class<?> kind, Object provider) {
        SERVICES.computeIfAbsent(kind, k -> new CopyOnWriteArrayList<>()).add(kind.cast(provider));
    }

    /** Removes a provider whose bundle went away (called by the binding component only). */
    public static void unbind(Class<?> kind, Object provider) {
        List<Object> list = SERVICES.get(kind);
        if (list != null) {
            list.remove(provider);
        }
    }

    /** From now on, answers come from the OSGi services bound so far and later (the binding component calls it). */
    public static void useServices() {
        services = true;
    }

    /** Back to the class path (the binding component calls it when it is deactivated). */
    public static void useClassPath() {
        services = false;
    }

    private static List<?> load(Class<?> kind) {
        List<Object> found = new ArrayList<>();
        ClassLoader loader = kind.getClassLoader() != null ? kind.getClassLoader() : ClassLoader.getSystemClassLoader();
        try {
            for (Object provider : ServiceLoader.load(kind, loader)) {
                found.add(provider);
            }
        } catch (ServiceConfigurationError e) {
            throw new IllegalStateException("an extension of kind " + kind.getName() + " cannot be loaded: " + e.getMessage(),
                    e);
        }
        return List.copyOf(found);
    }
}
