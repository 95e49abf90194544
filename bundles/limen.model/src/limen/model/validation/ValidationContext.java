package limen.model.validation;

import java.util.Map;

import org.eclipse.emf.ecore.EObject;

import limen.model.Calibration;
import limen.model.SessionHeader;

/**
 * Keys of the EMF validation context that Limen's constraints read. Levels and frequency ranges can only be
 * checked against a calibration: put it under {@link #CALIBRATION} in the context passed to
 * {@code Diagnostician.validate(EObject, Map)}, or use {@link BatteryValidator}, which does so.
 */
public final class ValidationContext {

    /** Context key whose value is the {@link Calibration} that levels and frequencies are checked against. */
    public static final String CALIBRATION = "limen.model.validation.calibration";

    private ValidationContext() {
    }

    /**
     * @param element the element being validated
     * @param context the validation context, may be null
     * @return the calibration in the context; else, inside a session header, the header's calibration snapshot;
     *         else null (range and ceiling checks are then skipped)
     */
    public static Calibration calibration(EObject element, Map<Object, Object> context) {
        if (context != null && context.get(CALIBRATION) instanceof Calibration calibration) {
            return calibration;
        }
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof SessionHeader session) {
                return session.getCalibration();
            }
        }
        return null;
    }
}
