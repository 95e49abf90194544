package limen.model.io;

import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.xmi.XMLHelper;
import org.eclipse.emf.ecore.xmi.XMLLoad;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.SAXXMIHandler;
import org.eclipse.emf.ecore.xmi.impl.XMILoadImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceImpl;
import org.xml.sax.helpers.DefaultHandler;

/**
 * The XMI resource of Limen files: UTF-8, unknown elements and attributes kept (and written back on save), no
 * DOCTYPE (so no external entities), references to steps by their ids, and the line and column of every
 * element's start tag recorded during load, so that problems can name their line.
 */
public class LimenResource extends XMIResourceImpl {

    /** SAX feature that refuses DOCTYPE declarations: no external entities, no entity expansion. */
    static final String DISALLOW_DOCTYPE = "http://apache.org/xml/features/disallow-doctype-decl";

    private final Map<EObject, int[]> startPositions = new HashMap<>();

    /** Creates a resource for the given URI with Limen's load and save options as defaults. */
    public LimenResource(URI uri) {
        super(uri);
        setEncoding("UTF-8");
        Map<Object, Object> load = getDefaultLoadOptions();
        load.put(XMLResource.OPTION_RECORD_UNKNOWN_FEATURE, Boolean.TRUE);
        load.put(XMLResource.OPTION_PARSER_FEATURES, Map.of(DISALLOW_DOCTYPE, Boolean.TRUE));
        load.put(XMLResource.OPTION_DEFER_IDREF_RESOLUTION, Boolean.TRUE);
        Map<Object, Object> save = getDefaultSaveOptions();
        save.put(XMLResource.OPTION_ENCODING, "UTF-8");
        save.put(XMLResource.OPTION_LINE_DELIMITER, "\n");
        save.put(XMLResource.OPTION_PROCESS_DANGLING_HREF, XMLResource.OPTION_PROCESS_DANGLING_HREF_THROW);
    }

    /**
     * @param element an element of this resource
     * @return {line, column} of the start tag of the element, or of its nearest ancestor with a known position,
     *         or {0, 0} when none is known (elements created after loading)
     */
    public int[] positionOf(EObject element) {
        for (EObject e = element; e != null; e = e.eContainer()) {
            int[] p = startPositions.get(e);
            if (p != null) {
                return p.clone();
            }
        }
        return new int[] {0, 0};
    }

    /**
     * SAX reports where a start tag ends; moves every recorded position to the '&lt;' that opens the tag, so
     * that tags spread over several lines are reported at their first line.
     *
     * @param text the document text the positions refer to
     */
    void moveToTagStarts(String text) {
        int[] lineStarts = lineStarts(text);
        for (int[] p : startPositions.values()) {
            if (p[0] < 1 || p[0] > lineStarts.length) {
                continue;
            }
            int offset = Math.min(text.length(), lineStarts[p[0] - 1] + Math.max(0, p[1] - 1));
            int open = text.lastIndexOf('<', Math.max(0, offset - 1));
            if (open < 0) {
                continue;
            }
            int line = lineOf(lineStarts, open);
            p[0] = line + 1;
            p[1] = open - lineStarts[line] + 1;
        }
    }

    private static int[] lineStarts(String text) {
        int count = 1;
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                count++;
            }
        }
        int[] starts = new int[count];
        int line = 1;
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                starts[line++] = i + 1;
            }
        }
        return starts;
    }

    private static int lineOf(int[] lineStarts, int offset) {
        int i = java.util.Arrays.binarySearch(lineStarts, offset);
        return i >= 0 ? i : -i - 2;
    }

    @Override
    protected void doUnload() {
        startPositions.clear();
        super.doUnload();
    }

    @Override
    protected XMLLoad createXMLLoad() {
        return new XMILoadImpl(createXMLHelper()) {
            @Override
            protected DefaultHandler makeDefaultHandler() {
                return new PositionRecordingHandler(resource, helper, options);
            }
        };
    }

    /** Records where each element starts while the SAX handler creates it. */
    private final class PositionRecordingHandler extends SAXXMIHandler {
        PositionRecordingHandler(XMLResource resource, XMLHelper helper, Map<?, ?> options) {
            super(resource, helper, options);
        }

        @Override
        protected void processObject(EObject object) {
            super.processObject(object);
            if (object != null) {
                startPositions.putIfAbsent(object, new int[] {getLineNumber(), getColumnNumber()});
            }
        }
    }
}
