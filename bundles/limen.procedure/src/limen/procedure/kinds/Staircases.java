package limen.procedure.kinds;

import limen.core.extension.Settings;
import limen.procedure.UpDownSettings;

/** Settings shared by the staircases: start, floor, ceiling and the step mode. */
final class Staircases {

    private Staircases() {
    }

    /** @return whether {@code stepMode} is MULTIPLICATIVE (ADDITIVE when not given) */
    static boolean multiplicative(Settings s) {
        String mode = s.text("stepMode", "ADDITIVE");
        if (!mode.equals("ADDITIVE") && !mode.equals("MULTIPLICATIVE")) {
            throw new IllegalArgumentException("setting 'stepMode' = " + mode + " is not ADDITIVE or MULTIPLICATIVE");
        }
        return mode.equals("MULTIPLICATIVE");
    }

    /** @return a builder with startValue, floorValue, ceilingValue and the step mode with its initial step */
    static UpDownSettings.Builder staircase(Settings s, double initialStep) {
        UpDownSettings.Builder b = UpDownSettings.builder().start(s.real("startValue"))
                .limits(s.real("floorValue"), s.real("ceilingValue"));
        return multiplicative(s) ? b.multiplicative(initialStep) : b.additive(initialStep);
    }
}
