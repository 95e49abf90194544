package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.num;
import static limen.model.validation.internal.Rules.report;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import limen.model.ExposureEstimate;
import limen.model.LimenPackage.Literals;
import limen.model.SessionHeader;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.validation.ProblemCode;

/** Invariants of {@link SessionHeader}. */
public final class SessionRules {

    private SessionRules() {
    }

    /**
     * LM0705 blank pseudonym, LM0701 end before start, LM0702 finished without end, LM0706 running with end,
     * LM0703 run order with a step outside the snapshot (the list itself holds each step once), LM0704 exposure
     * figures.
     */
    public static boolean validSession(SessionHeader h, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(h);
        if (h.getParticipant() != null && h.getParticipant().isBlank()) {
            ok &= report(diagnostics, ProblemCode.PARTICIPANT_BLANK, h, Literals.SESSION_HEADER__PARTICIPANT,
                    h.getParticipant(), "session: the participant pseudonym is blank");
        }
        if (h.getStartTime() != null && h.getEndTime() != null && h.getEndTime().isBefore(h.getStartTime())) {
            ok &= report(diagnostics, ProblemCode.SESSION_END_BEFORE_START, h, Literals.SESSION_HEADER__END_TIME,
                    h.getEndTime(), who + ": ends at " + h.getEndTime() + ", before its start at " + h.getStartTime());
        }
        boolean finished = h.getStatus() == SessionStatus.COMPLETED || h.getStatus() == SessionStatus.ABORTED;
        if (finished && h.getEndTime() == null) {
            ok &= report(diagnostics, ProblemCode.SESSION_END_MISSING, h, Literals.SESSION_HEADER__END_TIME, null,
                    who + ": status " + h.getStatus() + " needs an end time");
        } else if (h.getStatus() == SessionStatus.RUNNING && h.getEndTime() != null) {
            ok &= report(diagnostics, ProblemCode.SESSION_RUNNING_WITH_END, h, Literals.SESSION_HEADER__END_TIME,
                    h.getEndTime(), who + ": is RUNNING but has an end time " + h.getEndTime());
        }
        for (Step step : h.getStepOrder()) {
            if (!step.eIsProxy() && (h.getBattery() == null || step.eContainer() != h.getBattery())) {
                ok &= report(diagnostics, ProblemCode.SESSION_STEP_ORDER, h, Literals.SESSION_HEADER__STEP_ORDER,
                        step.getId(), who + ": the run order lists " + Labels.of(step)
                                + ", which is not in the battery snapshot");
            }
        }
        ExposureEstimate e = h.getExposure();
        if (e != null) {
            ok &= exposure(e, e.getSoundOnSeconds(), "sound-on time", " s",
                    Literals.EXPOSURE_ESTIMATE__SOUND_ON_SECONDS, Rules.notNegative(e.getSoundOnSeconds()), diagnostics);
            ok &= exposure(e, e.getPeakLevelDbSpl(), "peak level", " dB SPL", Literals.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL,
                    Double.isFinite(e.getPeakLevelDbSpl()), diagnostics);
            ok &= exposure(e, e.getEquivalentLevelDbSpl(), "equivalent level", " dB SPL",
                    Literals.EXPOSURE_ESTIMATE__EQUIVALENT_LEVEL_DB_SPL, Double.isFinite(e.getEquivalentLevelDbSpl())
                            && e.getEquivalentLevelDbSpl() <= e.getPeakLevelDbSpl() + 1e-9, diagnostics);
            if (h.getCalibration() != null && e.getPeakLevelDbSpl() > h.getCalibration().getCeilingDbSpl()) {
                ok &= report(diagnostics, ProblemCode.SESSION_EXPOSURE, e, Literals.EXPOSURE_ESTIMATE__PEAK_LEVEL_DB_SPL,
                        e.getPeakLevelDbSpl(), who + ": peak level " + num(e.getPeakLevelDbSpl())
                                + " dB SPL is above the ceiling " + num(h.getCalibration().getCeilingDbSpl())
                                + " dB SPL of the session's calibration");
            }
        }
        return ok;
    }

    private static boolean exposure(ExposureEstimate e, double value, String what, String unit,
            org.eclipse.emf.ecore.EStructuralFeature feature, boolean valid, DiagnosticChain diagnostics) {
        if (valid) {
            return true;
        }
        return report(diagnostics, ProblemCode.SESSION_EXPOSURE, e, feature, value, Labels.of(e) + ": exposure "
                + what + " " + num(value) + unit + " is not possible (negative, not finite, or an equivalent level"
                + " above the peak)");
    }
}
