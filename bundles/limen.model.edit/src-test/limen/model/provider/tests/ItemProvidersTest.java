package limen.model.provider.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Field;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;

import org.eclipse.emf.common.util.DelegatingResourceLocator;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import limen.model.Battery;
import limen.model.Step;
import limen.model.io.LimenFiles;
import limen.model.provider.LimenEditPlugin;
import limen.model.provider.LimenItemProviderAdapterFactory;

/** The generated item providers label and structure a demo battery as the authoring UI will show it. */
class ItemProvidersTest {

    private static Path examples() {
        String root = System.getProperty("limen.root");
        for (Path p = root != null ? Path.of(root) : Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("examples")) && Files.isDirectory(p.resolve("bundles"))) {
                return p.resolve("examples");
            }
        }
        throw new IllegalStateException("no examples folder above " + Path.of("").toAbsolutePath());
    }

    /**
     * In OSGi and from the jar, EMF finds plugin.properties at the bundle root; the plain test class path has
     * only target/classes, so point the plugin's resource locator at the bundle folder as a jar would.
     */
    @BeforeAll
    static void bundleRootLikeTheJar() throws Exception {
        Path bundle = examples().getParent().resolve("bundles/limen.model.edit");
        Field baseUrl = DelegatingResourceLocator.class.getDeclaredField("baseURL");
        baseUrl.setAccessible(true);
        baseUrl.set(LimenEditPlugin.INSTANCE, bundle.toUri().toURL());
    }

    @Test
    void labelsChildrenAndProperties() throws Exception {
        Battery battery = LimenFiles.loadBattery(examples().resolve("quest-thresholds.battery"));
        LimenItemProviderAdapterFactory factory = new LimenItemProviderAdapterFactory();
        IItemLabelProvider batteryLabel = (IItemLabelProvider) factory.adapt(battery, IItemLabelProvider.class);
        assertEquals("Battery Harbourside: QUEST absolute thresholds at 1000 and 4000 Hz", batteryLabel.getText(battery));
        ITreeItemContentProvider tree = (ITreeItemContentProvider) factory.adapt(battery, ITreeItemContentProvider.class);
        Collection<?> children = tree.getChildren(battery);
        assertEquals(battery.getSteps(), java.util.List.copyOf(children));
        Step step = battery.getSteps().get(0);
        IItemLabelProvider stepLabel = (IItemLabelProvider) factory.adapt(step, IItemLabelProvider.class);
        assertEquals("Step QUEST threshold 1000 Hz", stepLabel.getText(step));
        IItemPropertySource properties = (IItemPropertySource) factory.adapt(step.getStimulus(), IItemPropertySource.class);
        assertTrue(properties.getPropertyDescriptors(step.getStimulus()).stream()
                .anyMatch(d -> d.getId(step.getStimulus()).equals("standardFrequencyHz")));
        factory.dispose();
    }
}
