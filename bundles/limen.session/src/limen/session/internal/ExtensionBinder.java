package limen.session.internal;

import limen.core.extension.Extensions;
import limen.model.validation.ContributionCheck;
import limen.procedure.ProcedureKind;
import limen.psychometric.Sigmoid;
import limen.signal.StimulusDesign;

/**
 * The Declarative Services component ({@code OSGI-INF/limen.session.extensions.xml}) that feeds the
 * {@link Extensions} registry inside the workbench: it binds every service of the four extension kinds, from
 * Limen's bundles and from any lab bundle installed beside them, and switches the registry to them when it is
 * activated. Its bind methods take the service type alone (DS 1.3), so this class needs no OSGi API; DS
 * instantiates it through the public no-argument constructor. On a plain class path it is never created.
 */
public final class ExtensionBinder {

    /** Called by DS once the references present at start are bound. */
    public void activate() {
        Extensions.useServices();
    }

    /** Called by DS when the component goes away. */
    public void deactivate() {
        Extensions.useClassPath();
    }

    public void addFamily(Sigmoid family) {
        Extensions.bind(Sigmoid.class, family);
    }

    public void removeFamily(Sigmoid family) {
        Extensions.unbind(Sigmoid.class, family);
    }

    public void addProcedure(ProcedureKind kind) {
        Extensions.bind(ProcedureKind.class, kind);
    }

    public void removeProcedure(ProcedureKind kind) {
        Extensions.unbind(ProcedureKind.class, kind);
    }

    public void addDesign(StimulusDesign design) {
        Extensions.bind(StimulusDesign.class, design);
    }

    public void removeDesign(StimulusDesign design) {
        Extensions.unbind(StimulusDesign.class, design);
    }

    public void addCheck(ContributionCheck check) {
        Extensions.bind(ContributionCheck.class, check);
    }

    public void removeCheck(ContributionCheck check) {
        Extensions.unbind(ContributionCheck.class, check);
    }
}
