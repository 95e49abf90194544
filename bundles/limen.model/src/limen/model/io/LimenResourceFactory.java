package limen.model.io;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.impl.ResourceFactoryImpl;

/** Creates {@link LimenResource}s; registered for {@code *.battery}, {@code *.calibration} and {@code *.session}. */
public class LimenResourceFactory extends ResourceFactoryImpl {

    @Override
    public Resource createResource(URI uri) {
        return new LimenResource(uri);
    }
}
