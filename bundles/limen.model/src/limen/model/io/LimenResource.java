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
