package limen.model.validation.internal;

import org.eclipse.emf.ecore.EObject;

import limen.model.Battery;
import limen.model.Break;
import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.SessionHeader;
import limen.model.Setting;
import limen.model.SettingsGroup;
import limen.model.Step;
import limen.model.Track;

/** Names model elements in messages the way an experimenter knows them: by step title and track name. */
public final class Labels {

    private Labels() {
    }

    /** @return for example {@code step 'Frequency discrimination 1000 Hz', track 'A'} */
    public static String of(EObject element) {
        if (element == null) {
            return "element";
        }
        if (element instanceof Track track) {
            String name = track.getName() == null ? "#" + (indexIn(track) + 1) : "'" + track.getName() + "'";
            return of(track.eContainer()) + ", track " + name;
        }
        if (element instanceof Step step) {
            String title = step.getTitle() != null ? step.getTitle() : step.getId();
            return "step '" + title + "'";
        }
        if (element instanceof Battery battery) {
            return "battery '" + battery.getTitle() + "'";
        }
        if (element instanceof Break pause) {
            return of(pause.eContainer()) + ", break after " + pause.getAfterStepCount() + " steps";
        }
        if (element instanceof Calibration calibration) {
            return "calibration '" + calibration.getName() + "'";
        }
        if (element instanceof CalibrationPoint point) {
            return of(point.eContainer()) + ", point at " + Rules.num(point.getFrequencyHz()) + " Hz";
        }
        if (element instanceof SessionHeader session) {
            return "session of '" + session.getParticipant() + "'";
        }
        if (element instanceof SettingsGroup group) {
            return of(group.eContainer()) + ", settings of '" + group.getContributorId() + "'";
        }
        if (element instanceof Setting setting) {
            return of(setting.eContainer()) + ", setting '" + setting.getName() + "'";
        }
        EObject container = element.eContainer();
        return container != null ? of(container) : element.eClass().getName();
    }

    /** @return the step that contains the element (or is it), or null */
    public static Step stepOf(EObject element) {
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof Step step) {
                return step;
            }
        }
        return null;
    }

    /** @return the track that contains the element (or is it), or null */
    static Track trackOf(EObject element) {
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (e instanceof Track track) {
                return track;
            }
        }
        return null;
    }

    private static int indexIn(EObject element) {
        EObject container = element.eContainer();
        if (container == null || element.eContainingFeature() == null || !element.eContainingFeature().isMany()) {
            return 0;
        }
        return ((java.util.List<?>) container.eGet(element.eContainingFeature())).indexOf(element);
    }
}
