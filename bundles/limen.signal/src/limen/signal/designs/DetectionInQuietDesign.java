package limen.signal.designs;

import limen.core.extension.Settings;
import limen.signal.Sound;
import limen.signal.StimulusDesign;

/** Detection in quiet, {@code limen.detection-quiet}: target tone at v dB SPL, the other intervals silent. */
public final class DetectionInQuietDesign implements StimulusDesign {

    @Override
    public String id() {
        return "limen.detection-quiet";
    }

    @Override
    public String title() {
        return "Detection in quiet";
    }

    @Override
    public IntervalSounds design(Settings s, Presentation p) {
        double d = p.intervalSeconds();
        return new IntervalSounds(new Sound.Silence(d),
                new Sound.Tone(s.real("standardFrequencyHz"), p.value(), d, s.real("rampDurationSeconds")), null, 0);
    }
}
