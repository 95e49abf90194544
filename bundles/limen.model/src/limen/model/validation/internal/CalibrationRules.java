package limen.model.validation.internal;

import static limen.model.validation.internal.Rules.num;
import static limen.model.validation.internal.Rules.report;

import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;

import limen.model.Calibration;
import limen.model.CalibrationPoint;
import limen.model.LimenPackage.Literals;
import limen.model.validation.ProblemCode;

/** Invariants of {@link Calibration}. */
public final class CalibrationRules {

    /** Ceilings above this many dB SPL get a warning (common practice in psychoacoustic labs, not a standard). */
    static final double HIGH_CEILING_DB_SPL = 100;

    private CalibrationRules() {
    }

    /**
     * LM0604 sample rate, LM0605 reference level above 0 dBFS, LM0602 invalid points, LM0603 duplicate
     * frequencies, LM0606 ceiling not a positive finite level, LM0607 high ceiling, LM0608 demonstration only,
     * LM0610 who or when missing.
     */
    public static boolean validCalibration(Calibration c, DiagnosticChain diagnostics, Map<Object, Object> context) {
        boolean ok = true;
        String who = Labels.of(c);
        if (c.getSampleRateHz() <= 0) {
            ok &= report(diagnostics, ProblemCode.SAMPLE_RATE, c, Literals.CALIBRATION__SAMPLE_RATE_HZ,
                    c.getSampleRateHz(), who + ": sample rate " + c.getSampleRateHz() + " Hz must be positive");
        }
        if (!(c.getReferenceLevelDbfs() <= 0) || Double.isInfinite(c.getReferenceLevelDbfs())) {
            ok &= report(diagnostics, ProblemCode.REFERENCE_LEVEL_ABOVE_FULL_SCALE, c,
                    Literals.CALIBRATION__REFERENCE_LEVEL_DBFS, c.getReferenceLevelDbfs(), who + ": reference level "
                            + num(c.getReferenceLevelDbfs()) + " dBFS must be a finite level at or under 0 dBFS");
        }
        double nyquist = c.getSampleRateHz() / 2.0;
        Map<Double, CalibrationPoint> frequencies = new HashMap<>();
        for (CalibrationPoint point : c.getPoints()) {
            double f = point.getFrequencyHz();
            if (!Rules.positive(f) || c.getSampleRateHz() > 0 && f >= nyquist) {
                ok &= report(diagnostics, ProblemCode.CALIBRATION_POINT_INVALID, point,
                        Literals.CALIBRATION_POINT__FREQUENCY_HZ, f, Labels.of(point) + ": frequency " + num(f)
                                + " Hz must be positive and below the Nyquist frequency " + num(nyquist) + " Hz");
            } else if (frequencies.putIfAbsent(f, point) != null) {
                ok &= report(diagnostics, ProblemCode.CALIBRATION_DUPLICATE_FREQUENCY, point,
                        Literals.CALIBRATION_POINT__FREQUENCY_HZ, f, who + ": two points are at " + num(f) + " Hz");
            }
            if (!Double.isFinite(point.getMeasuredDbSpl())) {
                ok &= report(diagnostics, ProblemCode.CALIBRATION_POINT_INVALID, point,
                        Literals.CALIBRATION_POINT__MEASURED_DB_SPL, point.getMeasuredDbSpl(), Labels.of(point)
                                + ": measured level " + num(point.getMeasuredDbSpl()) + " dB SPL is not a finite number");
            }
        }
        if (!Rules.positive(c.getCeilingDbSpl())) {
            ok &= report(diagnostics, ProblemCode.CEILING_INVALID, c, Literals.CALIBRATION__CEILING_DB_SPL,
                    c.getCeilingDbSpl(), who + ": ceiling " + num(c.getCeilingDbSpl())
                            + " dB SPL must be a positive finite level");
        } else if (c.getCeilingDbSpl() > HIGH_CEILING_DB_SPL) {
            ok &= report(diagnostics, ProblemCode.CEILING_HIGH, c, Literals.CALIBRATION__CEILING_DB_SPL,
                    c.getCeilingDbSpl(), who + ": ceiling " + num(c.getCeilingDbSpl()) + " dB SPL is above "
                            + num(HIGH_CEILING_DB_SPL) + " dB SPL; check that such levels are really needed");
        }
        if (c.isDemonstrationOnly()) {
            ok &= report(diagnostics, ProblemCode.DEMONSTRATION_CALIBRATION, c,
                    Literals.CALIBRATION__DEMONSTRATION_ONLY, true, who
                            + ": is a demonstration calibration, not valid for any real headphone or loudspeaker;"
                            + " measure your own before testing listeners");
        }
        if (Rules.blank(c.getMeasuredBy()) || c.getMeasuredOn() == null) {
            ok &= report(diagnostics, ProblemCode.CALIBRATION_PROVENANCE, c,
                    Rules.blank(c.getMeasuredBy()) ? Literals.CALIBRATION__MEASURED_BY : Literals.CALIBRATION__MEASURED_ON,
                    null, who + ": does not say " + (Rules.blank(c.getMeasuredBy()) ? "who measured" : "when it was measured"));
        }
        return ok;
    }
}
