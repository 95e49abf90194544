package limen.session;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import limen.model.Calibration;
import limen.model.CalibrationPoint;

/** Converts the model's calibration (what the lab measured) into the signal bundle's immutable value type. */
public final class CalibrationMapping {

    private CalibrationMapping() {
    }

    /** @throws IllegalArgumentException naming the calibration when it cannot be used (no points, bad rate) */
    public static limen.signal.Calibration toSignal(Calibration c) {
        if (c == null) {
            throw new IllegalArgumentException("no calibration: a session needs one to know what level it plays");
        }
        List<CalibrationPoint> points = new ArrayList<>(c.getPoints());
        points.sort(Comparator.comparingDouble(CalibrationPoint::getFrequencyHz));
        double[] f = new double[points.size()];
        double[] spl = new double[points.size()];
        for (int i = 0; i < f.length; i++) {
            f[i] = points.get(i).getFrequencyHz();
            spl[i] = points.get(i).getMeasuredDbSpl();
        }
        String label = (c.getName() != null && !c.getName().isBlank()) ? c.getName()
                : (c.getDevice() + " / " + c.getTransducer());
        try {
            return new limen.signal.Calibration(label, c.getReferenceLevelDbfs(), f, spl, c.getCeilingDbSpl(),
                    c.getSampleRateHz());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("calibration " + label + ": " + e.getMessage(), e);
        }
    }
}
