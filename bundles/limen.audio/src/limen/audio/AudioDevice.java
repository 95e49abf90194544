package limen.audio;

import java.util.Objects;

import javax.sound.sampled.Mixer;

/**
 * One Java Sound mixer that can play ({@code SourceDataLine}) or record ({@code TargetDataLine}), as listed
 * by {@link Devices}. Equal when they name the same mixer.
 */
public final class AudioDevice {

    private final Mixer.Info info;

    AudioDevice(Mixer.Info info) {
        this.info = Objects.requireNonNull(info, "info");
    }

    /** The mixer's name, e.g. {@code default [default]}. */
    public String name() {
        return info.getName();
    }

    /** The mixer's description, e.g. {@code Direct Audio Device: default, default, default}. */
    public String description() {
        return info.getDescription();
    }

    public String vendor() {
        return info.getVendor();
    }

    Mixer.Info info() {
        return info;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof AudioDevice d && info.equals(d.info);
    }

    @Override
    public int hashCode() {
        return info.hashCode();
    }

    /** {@code name (description)}. */
    @Override
    public String toString() {
        return name() + " (" + description() + ")";
    }
}
