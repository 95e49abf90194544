package limen.ui.analysis.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.net.URL;
import java.util.ArrayList;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import limen.ui.analysis.AnalysisIds;
import limen.ui.analysis.parts.ArchiveBrowserPart;

/**
 * The model fragment as the workbench reads it: it adds the Analysis perspective to limen.ui's perspective
 * stack, and every part it names is a class of this bundle (a typo would leave an empty part in the window).
 */
class WorkAreaModelTest {

    private static Document xml(URL url) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(false);
        try (InputStream in = url.openStream()) {
            return f.newDocumentBuilder().parse(in);
        }
    }

    @Test
    void fragmentContributesThePerspectiveAndItsPartsExist() throws Exception {
        Bundle host = FrameworkUtil.getBundle(ArchiveBrowserPart.class);
        URL fragment = host.getEntry("fragment.e4xmi");
        assertTrue(fragment != null, "fragment.e4xmi is in the bundle (build.properties)");
        assertTrue(host.getEntry("plugin.xml") != null, "plugin.xml is in the bundle");
        Document d = xml(fragment);
        NodeList fragments = d.getElementsByTagName("fragments");
        assertEquals(1, fragments.getLength());
        assertEquals("limen.ui.perspectivestack", ((Element) fragments.item(0)).getAttribute("parentElementId"));

        // the parent id is the perspective stack of limen.ui's application model
        Bundle ui = FrameworkUtil.getBundle(limen.ui.LimenPreferences.class);
        Document app = xml(ui.getEntry("Application.e4xmi"));
        boolean stack = false;
        NodeList all = app.getElementsByTagName("*");
        for (int i = 0; i < all.getLength(); i++) {
            stack |= "limen.ui.perspectivestack".equals(((Element) all.item(i)).getAttribute("elementId"));
        }
        assertTrue(stack, "limen.ui has the perspective stack");

        List<String> parts = new ArrayList<>();
        NodeList elements = d.getElementsByTagName("*");
        for (int i = 0; i < elements.getLength(); i++) {
            Element e = (Element) elements.item(i);
            if (e.getAttribute("elementId").equals(AnalysisIds.PERSPECTIVE)) {
                assertEquals("Analysis", e.getAttribute("label"));
            }
            String uri = e.getAttribute("contributionURI");
            if (!uri.isEmpty()) {
                String prefix = "bundleclass://limen.ui.analysis/";
                assertTrue(uri.startsWith(prefix), uri);
                host.loadClass(uri.substring(prefix.length()));
                parts.add(e.getAttribute("elementId"));
            }
        }
        assertEquals(List.of(AnalysisIds.BROWSER_PART, AnalysisIds.SESSION_PART, AnalysisIds.SUMMARY_PART), parts);
    }
}
