package limen.model.validation;

import java.util.Arrays;
import java.util.Optional;

/**
 * The stable codes of every problem Limen reports about a document ({@code LM0001} ...). A code never changes
 * meaning once released; retired codes are not reused. Ranges: LM00xx structure, LM01xx battery, steps and
 * tasks, LM02xx stimuli, levels and frequencies, LM03xx procedures, LM04xx stopping rules, LM05xx references
 * between steps, LM06xx calibrations, LM07xx session headers, LM08xx contributed settings, LM09xx files.
 * <p>
 * In EMF diagnostics the code appears as {@link #number()} with source {@link #SOURCE}.
 */
public enum ProblemCode {
    /** A required value or element is missing. */
    MISSING_REQUIRED(1, Severity.ERROR, "A required value or element is missing."),
    /** A reference points at nothing that can be loaded. */
    UNRESOLVED_REFERENCE(2, Severity.ERROR, "A reference points at nothing that can be loaded."),
    /** The element breaks one of EMF's structural rules. */
    STRUCTURE_INVALID(3, Severity.ERROR, "The element breaks one of EMF's structural rules."),
    /** Two steps share an id. */
    DUPLICATE_STEP_ID(102, Severity.ERROR, "Two steps share an id."),
    /** A shuffle seed is given but the ordering does not shuffle. */
    SEED_WITHOUT_SHUFFLE(103, Severity.WARNING, "A shuffle seed is given but the ordering does not shuffle."),
    /** The ordering permutes steps but fewer than two steps may move. */
    NOTHING_TO_PERMUTE(104, Severity.WARNING, "The ordering permutes steps but fewer than two steps may move."),
    /** A break does not lie between two steps. */
    BREAK_OUT_OF_RANGE(105, Severity.ERROR, "A break does not lie between two steps."),
    /** A break's minimum duration is negative or not a number. */
    BREAK_DURATION_NEGATIVE(106, Severity.ERROR, "A break's minimum duration is negative or not a number."),
    /** Two breaks follow the same step. */
    BREAKS_AT_SAME_PLACE(107, Severity.WARNING, "Two breaks follow the same step."),
    /** A step id is blank or contains white space. */
    STEP_ID_INVALID(108, Severity.ERROR, "A step id is blank or contains white space."),
    /** The interval duration is not positive. */
    INTERVAL_NOT_POSITIVE(110, Severity.ERROR, "The interval duration is not positive."),
    /** The inter-stimulus interval is negative. */
    ISI_NEGATIVE(111, Severity.ERROR, "The inter-stimulus interval is negative."),
    /** The response window is given but not positive. */
    RESPONSE_WINDOW_NOT_POSITIVE(112, Severity.ERROR, "The response window is given but not positive."),
    /** The inter-trial interval is negative. */
    ITI_NEGATIVE(113, Severity.ERROR, "The inter-trial interval is negative."),
    /** An nAFC task does not have 2, 3 or 4 intervals. */
    INTERVAL_COUNT(114, Severity.ERROR, "An nAFC task does not have 2, 3 or 4 intervals."),
    /** The catch-trial rate is outside [0, 1). */
    CATCH_RATE(115, Severity.ERROR, "The catch-trial rate is outside [0, 1)."),
    /** The standard frequency is not positive. */
    FREQUENCY_NOT_POSITIVE(201, Severity.ERROR, "The standard frequency is not positive."),
    /** A frequency is at or above half the calibration's sample rate. */
    ABOVE_NYQUIST(202, Severity.ERROR, "A frequency is at or above half the calibration's sample rate."),
    /** A frequency lies outside the calibrated frequencies. */
    OUTSIDE_CALIBRATED_RANGE(203, Severity.ERROR, "A frequency lies outside the calibrated frequencies."),
    /** The ramp duration is negative. */
    RAMP_NEGATIVE(204, Severity.ERROR, "The ramp duration is negative."),
    /** The ramps are longer than half the interval. */
    RAMP_TOO_LONG(205, Severity.ERROR, "The ramps are longer than half the interval."),
    /** The ramps are shorter than 5 ms, so the tone onsets splatter energy across frequency. */
    RAMP_SHORT(206, Severity.WARNING, "The ramps are shorter than 5 ms, so the tone onsets splatter energy across frequency."),
    /** A discrimination step has no standard level. */
    STANDARD_LEVEL_MISSING(210, Severity.ERROR, "A discrimination step has no standard level."),
    /** A fixed level is above the calibration ceiling. */
    LEVEL_ABOVE_CEILING(211, Severity.ERROR, "A fixed level is above the calibration ceiling."),
    /** A relative level can exceed the ceiling for some listeners. */
    RELATIVE_LEVEL_MAY_EXCEED_CEILING(212, Severity.WARNING, "A relative level can exceed the ceiling for some listeners."),
    /** A level needs more than the output's full scale at that frequency. */
    LEVEL_ABOVE_FULL_SCALE(213, Severity.ERROR, "A level needs more than the output's full scale at that frequency."),
    /** The highest level a track can present is above the ceiling. */
    VARIED_LEVEL_ABOVE_CEILING(214, Severity.ERROR, "The highest level a track can present is above the ceiling."),
    /** A detection step has a standard level, which is not used. */
    STANDARD_LEVEL_IGNORED(215, Severity.WARNING, "A detection step has a standard level, which is not used."),
    /** A level or offset is not a finite number. */
    LEVEL_NOT_FINITE(216, Severity.ERROR, "A level or offset is not a finite number."),
    /** The varied quantity's unit does not fit the stimulus kind. */
    UNIT_DOES_NOT_FIT_KIND(220, Severity.ERROR, "The varied quantity's unit does not fit the stimulus kind."),
    /** A log scale or multiplicative steps meet values that are not positive. */
    VALUES_NOT_POSITIVE(221, Severity.ERROR, "A log scale or multiplicative steps meet values that are not positive."),
    /** A discrimination track can present a negative difference. */
    NEGATIVE_DIFFERENCE(223, Severity.ERROR, "A discrimination track can present a negative difference."),
    /** Detection in noise has no masker. */
    MASKER_MISSING(230, Severity.ERROR, "Detection in noise has no masker."),
    /** A masker is given for a kind other than detection in noise. */
    MASKER_IGNORED(231, Severity.WARNING, "A masker is given for a kind other than detection in noise."),
    /** The masker band edges are not 0 < low < high. */
    MASKER_BAND_INVALID(232, Severity.ERROR, "The masker band edges are not 0 < low < high."),
    /** The tone lies outside the masker band. */
    TONE_OUTSIDE_MASKER_BAND(235, Severity.WARNING, "The tone lies outside the masker band."),
    /** The floor is not below the ceiling. */
    LIMITS_INVERTED(301, Severity.ERROR, "The floor is not below the ceiling."),
    /** The start value lies outside [floor, ceiling]. */
    START_OUTSIDE_LIMITS(302, Severity.ERROR, "The start value lies outside [floor, ceiling]."),
    /** An additive step size is not positive. */
    STEP_NOT_POSITIVE(303, Severity.ERROR, "An additive step size is not positive."),
    /** A multiplicative step factor is not above 1. */
    STEP_FACTOR_NOT_ABOVE_ONE(304, Severity.ERROR, "A multiplicative step factor is not above 1."),
    /** Step sizes are not ordered minimum <= initial (<= maximum). */
    STEP_SIZES_DISORDERED(305, Severity.ERROR, "Step sizes are not ordered minimum <= initial (<= maximum)."),
    /** An up or down count is below 1. */
    UP_DOWN_COUNT(306, Severity.ERROR, "An up or down count is below 1."),
    /** The step shrink rule is invalid. */
    SHRINK_RULE(307, Severity.ERROR, "The step shrink rule is invalid."),
    /** Reversal counts are negative or the averaged count is below 1. */
    REVERSAL_COUNTS(308, Severity.ERROR, "Reversal counts are negative or the averaged count is below 1."),
    /** The target probability is not between chance and 1. */
    TARGET_PROBABILITY(309, Severity.ERROR, "The target probability is not between chance and 1."),
    /** Weighted up-down steps do not converge on the stated target. */
    WEIGHTED_RATIO(310, Severity.WARNING, "Weighted up-down steps do not converge on the stated target."),
    /** The PEST Wald deviation limit is not positive. */
    WALD_LIMIT(311, Severity.ERROR, "The PEST Wald deviation limit is not positive."),
    /** A QUEST/ZEST setting is out of range. */
    QUEST_SETTINGS(312, Severity.ERROR, "A QUEST/ZEST setting is out of range."),
    /** A lapse rate is outside [0, 0.5). */
    LAPSE_RATE(313, Severity.ERROR, "A lapse rate is outside [0, 0.5)."),
    /** A guess rate is outside [0, 1) or guess plus lapse reaches 1. */
    GUESS_RATE(314, Severity.ERROR, "A guess rate is outside [0, 1) or guess plus lapse reaches 1."),
    /** A guess rate differs from the task's chance rate. */
    GUESS_RATE_NOT_CHANCE(315, Severity.WARNING, "A guess rate differs from the task's chance rate."),
    /** A Psi grid is invalid. */
    PSI_GRID(316, Severity.ERROR, "A Psi grid is invalid."),
    /** Constant stimuli values repeat, are not finite, or have no repetitions. */
    CONSTANT_VALUES(317, Severity.ERROR, "Constant stimuli values repeat, are not finite, or have no repetitions."),
    /** A Psi grid is so large that trials may wait on computation. */
    PSI_GRID_LARGE(318, Severity.WARNING, "A Psi grid is so large that trials may wait on computation."),
    /** A stopping rule sets no criterion. */
    NO_STOPPING_CRITERION(401, Severity.ERROR, "A stopping rule sets no criterion."),
    /** A stopping criterion is not positive. */
    STOPPING_VALUE_NOT_POSITIVE(402, Severity.ERROR, "A stopping criterion is not positive."),
    /** No criterion of the stopping rule can end the track's procedure. */
    CANNOT_END(403, Severity.ERROR, "No criterion of the stopping rule can end the track's procedure."),
    /** The reversal limit leaves no reversal after the discarded ones. */
    NO_REVERSALS_LEFT(404, Severity.ERROR, "The reversal limit leaves no reversal after the discarded ones."),
    /** The reversal limit leaves fewer reversals than the estimate averages. */
    FEW_REVERSALS_TO_AVERAGE(405, Severity.WARNING, "The reversal limit leaves fewer reversals than the estimate averages."),
    /** A stopping criterion can never be met by this procedure. */
    CRITERION_NEVER_REACHED(406, Severity.WARNING, "A stopping criterion can never be met by this procedure."),
    /** A trial limit ends constant stimuli before every value has its repetitions. */
    CONSTANT_STIMULI_TRUNCATED(407, Severity.WARNING, "A trial limit ends constant stimuli before every value has its repetitions."),
    /** A relative level refers to a step of another battery. */
    REFERENCE_OUTSIDE_BATTERY(501, Severity.ERROR, "A relative level refers to a step of another battery."),
    /** A relative level refers to a step that does not always run earlier. */
    REFERENCE_NOT_EARLIER(502, Severity.ERROR, "A relative level refers to a step that does not always run earlier."),
    /** A relative level refers to a step that does not measure an absolute threshold in dB SPL. */
    REFERENCE_NOT_THRESHOLD(503, Severity.ERROR, "A relative level refers to a step that does not measure an absolute threshold in dB SPL."),
    /** A relative level refers to a threshold at another frequency. */
    REFERENCE_OTHER_FREQUENCY(504, Severity.ERROR, "A relative level refers to a threshold at another frequency."),
    /** Relative levels refer to each other in a cycle. */
    REFERENCE_CYCLE(505, Severity.ERROR, "Relative levels refer to each other in a cycle."),
    /** A calibration point is not finite, not positive or not below Nyquist. */
    CALIBRATION_POINT_INVALID(602, Severity.ERROR, "A calibration point is not finite, not positive or not below Nyquist."),
    /** Two calibration points share a frequency. */
    CALIBRATION_DUPLICATE_FREQUENCY(603, Severity.ERROR, "Two calibration points share a frequency."),
    /** The calibration's sample rate is not positive. */
    SAMPLE_RATE(604, Severity.ERROR, "The calibration's sample rate is not positive."),
    /** The reference digital level is above 0 dBFS. */
    REFERENCE_LEVEL_ABOVE_FULL_SCALE(605, Severity.ERROR, "The reference digital level is above 0 dBFS."),
    /** The ceiling is not a positive finite level. */
    CEILING_INVALID(606, Severity.ERROR, "The ceiling is not a positive finite level."),
    /** The ceiling is above 100 dB SPL. */
    CEILING_HIGH(607, Severity.WARNING, "The ceiling is above 100 dB SPL."),
    /** The calibration is a demonstration, not valid for any real transducer. */
    DEMONSTRATION_CALIBRATION(608, Severity.WARNING, "The calibration is a demonstration, not valid for any real transducer."),
    /** The calibration does not say who measured or when. */
    CALIBRATION_PROVENANCE(610, Severity.WARNING, "The calibration does not say who measured or when."),
    /** The session ends before it starts. */
    SESSION_END_BEFORE_START(701, Severity.ERROR, "The session ends before it starts."),
    /** A completed or aborted session has no end time. */
    SESSION_END_MISSING(702, Severity.ERROR, "A completed or aborted session has no end time."),
    /** The run order lists a step that is not in the battery snapshot. */
    SESSION_STEP_ORDER(703, Severity.ERROR, "The run order lists a step that is not in the battery snapshot."),
    /** Exposure figures are negative, not finite, or above the ceiling. */
    SESSION_EXPOSURE(704, Severity.ERROR, "Exposure figures are negative, not finite, or above the ceiling."),
    /** The participant pseudonym is blank. */
    PARTICIPANT_BLANK(705, Severity.ERROR, "The participant pseudonym is blank."),
    /** A running session has an end time. */
    SESSION_RUNNING_WITH_END(706, Severity.WARNING, "A running session has an end time."),
    /** Two settings of a group share a name. */
    DUPLICATE_SETTING(801, Severity.ERROR, "Two settings of a group share a name."),
    /** A setting's value does not parse as its type. */
    SETTING_VALUE_TYPE(802, Severity.ERROR, "A setting's value does not parse as its type."),
    /** A contributor id or setting name is blank. */
    SETTING_NAME_BLANK(803, Severity.ERROR, "A contributor id or setting name is blank."),
    /** Values of a contributed procedure cannot be checked here. */
    CONTRIBUTED_NOT_CHECKED(804, Severity.WARNING, "Values of a contributed procedure cannot be checked here."),
    /** The procedure or stimulus design a settings group names is not installed. */
    CONTRIBUTION_NOT_INSTALLED(805, Severity.ERROR, "The procedure or stimulus design a settings group names is not installed."),
    /** The installed contributor refuses the settings it is given. */
    CONTRIBUTION_REFUSED(806, Severity.ERROR, "The installed contributor refuses the settings it is given."),
    /** A stimulus holds more than one contributed design. */
    STIMULUS_CONTRIBUTIONS_MANY(807, Severity.ERROR, "A stimulus holds more than one contributed design."),
    /** The file is not well-formed XML (truncated, garbage, wrong encoding). */
    MALFORMED_FILE(901, Severity.ERROR, "The file is not well-formed XML (truncated, garbage, wrong encoding)."),
    /** An unknown element or attribute was kept as it is. */
    UNKNOWN_CONTENT_KEPT(902, Severity.WARNING, "An unknown element or attribute was kept as it is."),
    /** The file's schema version is missing or newer than this software. */
    SCHEMA_VERSION(903, Severity.ERROR, "The file's schema version is missing or newer than this software."),
    /** The file holds no Limen document or an unknown kind of element. */
    NOT_A_LIMEN_DOCUMENT(904, Severity.ERROR, "The file holds no Limen document or an unknown kind of element."),
    /** The file cannot be read. */
    UNREADABLE_FILE(905, Severity.ERROR, "The file cannot be read."),
    /** A value in the file cannot be read as its type. */
    INVALID_VALUE(906, Severity.ERROR, "A value in the file cannot be read as its type."),
    /** A reference names an id that does not exist in the file. */
    UNRESOLVED_ID(907, Severity.ERROR, "A reference names an id that does not exist in the file."),
    /** The calibration the battery names cannot be loaded. */
    CALIBRATION_NOT_LOADED(908, Severity.ERROR, "The calibration the battery names cannot be loaded."),
    /** The file name's extension does not match the document kind. */
    EXTENSION_MISMATCH(909, Severity.WARNING, "The file name's extension does not match the document kind."),
    /** Loading failed for a reason not covered by another code. */
    LOAD_FAILED(910, Severity.ERROR, "Loading failed for a reason not covered by another code."),
    /** No calibration is known, so levels and frequency ranges are not checked. */
    NO_CALIBRATION(911, Severity.WARNING, "No calibration is known, so levels and frequency ranges are not checked.");

    /** The {@code Diagnostic.getSource()} of every diagnostic carrying one of these codes. */
    public static final String SOURCE = "limen.model";

    private final int number;
    private final Severity severity;
    private final String description;

    ProblemCode(int number, Severity severity, String description) {
        this.number = number;
        this.severity = severity;
        this.description = description;
    }

    /** @return the number, for example 205 for {@code LM0205} */
    public int number() {
        return number;
    }

    /** @return the code as printed, for example {@code LM0205} */
    public String code() {
        return String.format("LM%04d", number);
    }

    /** @return the severity every problem with this code has */
    public Severity severity() {
        return severity;
    }

    /** @return one sentence saying what the code means */
    public String description() {
        return description;
    }

    /**
     * @param number a code number such as 205
     * @return the code with that number, if there is one
     */
    public static Optional<ProblemCode> ofNumber(int number) {
        return Arrays.stream(values()).filter(c -> c.number == number).findFirst();
    }
}
