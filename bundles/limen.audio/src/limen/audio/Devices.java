package limen.audio;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioSystem;
import javax.sound.sampled.DataLine;
import javax.sound.sampled.Line;
import javax.sound.sampled.LineUnavailableException;
import javax.sound.sampled.Mixer;
import javax.sound.sampled.SourceDataLine;
import javax.sound.sampled.TargetDataLine;

/**
 * The audio devices Java Sound offers: output mixers (those with a {@code SourceDataLine}) and capture mixers
 * (those with a {@code TargetDataLine}); choosing one by name or the default; opening its lines.
 * <p>
 * With no sound card and no sound server, Java Sound lists no mixer and
 * {@code AudioSystem.getSourceDataLine} throws {@link IllegalArgumentException} (measured on Debian 12,
 * OpenJDK 17). Every such case becomes a {@link NoDeviceException} with the message
 * {@value #NO_OUTPUT_MESSAGE}, so the caller can fall back to WAV files or no output. Java Sound looks for
 * devices once per JVM: a sound server started after the first look is not seen until the JVM restarts.
 */
public final class Devices {

    /** The message for a machine without any output device. */
    public static final String NO_OUTPUT_MESSAGE = "no audio output device: playback unavailable, render to WAV instead";

    /** The message for a machine without any capture device. */
    public static final String NO_CAPTURE_MESSAGE = "no audio capture device: nothing can be recorded";

    /** Where the mixers come from: {@link AudioSystem} normally, a fixed set in tests. */
    public interface MixerSource {
        /** The installed mixers. */
        Mixer.Info[] mixerInfo();

        /** The mixer behind one of {@link #mixerInfo()}'s entries. */
        Mixer mixer(Mixer.Info info);
    }

    private static final MixerSource SYSTEM = new MixerSource() {
        @Override
        public Mixer.Info[] mixerInfo() {
            return AudioSystem.getMixerInfo();
        }

        @Override
        public Mixer mixer(Mixer.Info info) {
            return AudioSystem.getMixer(info);
        }
    };

    private final MixerSource source;

    public Devices(MixerSource source) {
        this.source = Objects.requireNonNull(source, "source");
    }

    /** The devices of this JVM's Java Sound. */
    public static Devices system() {
        return new Devices(SYSTEM);
    }

    /** Mixers that offer a {@code SourceDataLine}, in Java Sound's order. */
    public List<AudioDevice> outputs() {
        return withLine(SourceDataLine.class);
    }

    /** Mixers that offer a {@code TargetDataLine}, in Java Sound's order. */
    public List<AudioDevice> captures() {
        return withLine(TargetDataLine.class);
    }

    /**
     * An output device by name, or the default one.
     *
     * @param name {@code null} or blank for the default (the mixer whose name contains {@code [default]}, else the
     *        first listed); otherwise a name matched exactly (ignoring case), else the one device whose name or
     *        description contains it
     * @throws NoDeviceException if there is no output device ({@value #NO_OUTPUT_MESSAGE}), or none or several
     *         match the name (the message lists the devices)
     */
    public AudioDevice chooseOutput(String name) throws NoDeviceException {
        return choose(outputs(), name, NO_OUTPUT_MESSAGE, "output");
    }

    /**
     * A capture device by name, or the default one (same matching as {@link #chooseOutput}).
     *
     * @throws NoDeviceException if there is none ({@value #NO_CAPTURE_MESSAGE}) or the name does not match one
     */
    public AudioDevice chooseCapture(String name) throws NoDeviceException {
        return choose(captures(), name, NO_CAPTURE_MESSAGE, "capture");
    }

    /**
     * Opens a playback line in {@code format} with a buffer of {@code bufferBytes}. Java Sound's
     * {@link IllegalArgumentException} (no such line or format) and {@link LineUnavailableException} (busy or
     * refused) both mean there is no device to use.
     */
    SourceDataLine openOutputLine(AudioDevice device, AudioFormat format, int bufferBytes) throws NoDeviceException {
        return openLine(device, SourceDataLine.class, format, bufferBytes, NO_OUTPUT_MESSAGE);
    }

    /** Opens a capture line, as {@link #openOutputLine}. */
    TargetDataLine openCaptureLine(AudioDevice device, AudioFormat format, int bufferBytes) throws NoDeviceException {
        return openLine(device, TargetDataLine.class, format, bufferBytes, NO_CAPTURE_MESSAGE);
    }

    private <L extends DataLine> L openLine(AudioDevice device, Class<L> type, AudioFormat format, int bufferBytes,
            String none) throws NoDeviceException {
        DataLine.Info info = new DataLine.Info(type, format, bufferBytes);
        L line;
        try {
            line = type.cast(source.mixer(device.info()).getLine(info));
        } catch (IllegalArgumentException | LineUnavailableException e) {
            throw new NoDeviceException(none + " (" + device.name() + " offers no " + type.getSimpleName() + " for "
                    + format + ": " + e.getMessage() + ")", e);
        }
        try {
            if (line instanceof SourceDataLine s) {
                s.open(format, bufferBytes);
            } else {
                ((TargetDataLine) line).open(format, bufferBytes);
            }
        } catch (IllegalArgumentException | LineUnavailableException | IllegalStateException e) {
            throw new NoDeviceException(none + " (" + device.name() + " could not be opened for " + format + ": "
                    + e.getMessage() + ")", e);
        }
        return line;
    }

    private List<AudioDevice> withLine(Class<? extends DataLine> type) {
        List<AudioDevice> found = new ArrayList<>();
        Line.Info wanted = new Line.Info(type);
        for (Mixer.Info info : source.mixerInfo()) {
            Mixer mixer;
            try {
                mixer = source.mixer(info);
            } catch (IllegalArgumentException | SecurityException e) {
                continue; // listed but not obtainable: not a usable device
            }
            if (mixer != null && mixer.isLineSupported(wanted)) {
                found.add(new AudioDevice(info));
            }
        }
        return List.copyOf(found);
    }

    private static AudioDevice choose(List<AudioDevice> devices, String name, String none, String kind)
            throws NoDeviceException {
        if (devices.isEmpty()) {
            throw new NoDeviceException(none);
        }
        if (name == null || name.isBlank()) {
            for (AudioDevice d : devices) {
                if (d.name().contains("[default]")) {
                    return d;
                }
            }
            return devices.get(0);
        }
        for (AudioDevice d : devices) {
            if (d.name().equalsIgnoreCase(name)) {
                return d;
            }
        }
        String needle = name.toLowerCase(Locale.ROOT);
        List<AudioDevice> matches = new ArrayList<>();
        for (AudioDevice d : devices) {
            if (d.name().toLowerCase(Locale.ROOT).contains(needle)
                    || d.description().toLowerCase(Locale.ROOT).contains(needle)) {
                matches.add(d);
            }
        }
        if (matches.size() == 1) {
            return matches.get(0);
        }
        throw new NoDeviceException((matches.isEmpty() ? "no audio " + kind + " device matches '" + name + "'"
                : "audio " + kind + " device name '" + name + "' is ambiguous") + "; " + kind + " devices: "
                + names(matches.isEmpty() ? devices : matches));
    }

    private static String names(List<AudioDevice> devices) {
        StringBuilder b = new StringBuilder();
        for (AudioDevice d : devices) {
            b.append(b.length() == 0 ? "" : ", ").append('\'').append(d.name()).append('\'');
        }
        return b.toString();
    }
}
