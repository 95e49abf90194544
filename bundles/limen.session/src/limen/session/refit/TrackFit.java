package limen.session.refit;

import limen.fit.BootstrapResult;
import limen.fit.FitResult;
import limen.fit.ReversalEstimate;

/**
 * The refit of one track: its data, the maximum-likelihood fit, the bootstrap (when asked) and the
 * staircase estimate from the reversals. When the fit failed, {@code fit} is null and {@code message} says
 * why.
 *
 * @param data      the track's trials
 * @param outcome   what happened
 * @param message   why the fit failed, or the fit's warnings joined by "; " (empty when none)
 * @param fit       the fit, or null
 * @param bootstrap the bootstrap of the fit, or null when not asked or the fit failed
 * @param reversals the reversal estimate on its averaging scale (log10 values when {@link TrackData#logScale}),
 *                  or null when the track has too few reversals
 */
public record TrackFit(TrackData data, Outcome outcome, String message, FitResult fit, BootstrapResult bootstrap,
        ReversalEstimate reversals) {

    /** How a track's refit ended. */
    public enum Outcome {
        /** fitted */
        FITTED,
        /** the data cannot identify the function (e.g. all correct) */
        NOT_IDENTIFIABLE,
        /** the data do not suit the settings (e.g. Weibull on values that are not positive, no signal trials) */
        INVALID_DATA
    }

    public TrackFit {
        if (data == null || outcome == null || message == null) {
            throw new IllegalArgumentException("data, outcome and message are required");
        }
        if ((outcome == Outcome.FITTED) != (fit != null)) {
            throw new IllegalArgumentException("a fit is present exactly when the outcome is FITTED, outcome " + outcome);
        }
    }

    /** @return the reversal mean in the track's unit (geometric mean on a log scale), NaN when absent */
    public double reversalMean() {
        if (reversals == null) {
            return Double.NaN;
        }
        return data.logScale() ? Math.pow(10, reversals.mean()) : reversals.mean();
    }

    /** @return the reversals' standard deviation on the averaging scale (log10 units on a log scale), NaN when absent */
    public double reversalSd() {
        return reversals == null ? Double.NaN : reversals.standardDeviation();
    }
}
