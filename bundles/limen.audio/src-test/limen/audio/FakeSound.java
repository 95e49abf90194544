package limen.audio;

import java.lang.reflect.InvocationHandler;
import java.lang.reflect.Proxy;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntUnaryOperator;

import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.DataLine;
import javax.sound.sampled.Line;
import javax.sound.sampled.LineUnavailableException;
import javax.sound.sampled.Mixer;
import javax.sound.sampled.SourceDataLine;
import javax.sound.sampled.TargetDataLine;

/**
 * Stand-ins for Java Sound mixers and lines (dynamic proxies), so the device-choice, no-device and
 * device-loss logic can be tested on any machine. Only the methods the outputs call are answered.
 */
final class FakeSound {

    private FakeSound() {
    }

    /** How a fake mixer's {@code getLine} behaves. */
    enum Open {
        WORKS, NO_LINE, UNAVAILABLE
    }

    static Mixer.Info info(String name, String description) {
        return new Mixer.Info(name, "Harbourside test vendor", description, "1.0") {
        };
    }

    /** A source of the given mixers. */
    static Devices.MixerSource source(List<Mixer.Info> infos, List<Mixer> mixers) {
        return new Devices.MixerSource() {
            @Override
            public Mixer.Info[] mixerInfo() {
                return infos.toArray(new Mixer.Info[0]);
            }

            @Override
            public Mixer mixer(Mixer.Info info) {
                int i = infos.indexOf(info);
                if (i < 0) {
                    throw new IllegalArgumentException("no mixer " + info);
                }
                return mixers.get(i);
            }
        };
    }

    /** No mixers at all, as on a machine without sound card or server. */
    static Devices.MixerSource empty() {
        return source(List.of(), List.of());
    }

    /** A playback-only mixer whose line is {@code line} (when {@code open} is WORKS). */
    static Mixer outputMixer(Mixer.Info info, Open open, SourceDataLine line) {
        InvocationHandler h = (proxy, m, args) -> switch (m.getName()) {
            case "getMixerInfo" -> info;
            case "isLineSupported" -> SourceDataLine.class.isAssignableFrom(((Line.Info) args[0]).getLineClass());
            case "getSourceLineInfo" -> new Line.Info[] {new DataLine.Info(SourceDataLine.class, (AudioFormat) null)};
            case "getTargetLineInfo" -> new Line.Info[0];
            case "getLine" -> switch (open) {
                case WORKS -> line;
                case NO_LINE -> throw new IllegalArgumentException("No line matching " + args[0] + " is supported.");
                case UNAVAILABLE -> throw new LineUnavailableException("line busy (Harbourside test)");
            };
            case "toString" -> "fake mixer " + info.getName();
            case "hashCode" -> System.identityHashCode(proxy);
            case "equals" -> proxy == args[0];
            default -> throw new UnsupportedOperationException(m.getName());
        };
        return (Mixer) Proxy.newProxyInstance(FakeSound.class.getClassLoader(), new Class<?>[] {Mixer.class}, h);
    }

    /** A capture-only mixer (its line is never opened in these tests). */
    static Mixer captureMixer(Mixer.Info info) {
        InvocationHandler h = (proxy, m, args) -> switch (m.getName()) {
            case "getMixerInfo" -> info;
            case "isLineSupported" -> TargetDataLine.class.isAssignableFrom(((Line.Info) args[0]).getLineClass());
            case "getLine" -> throw new IllegalArgumentException("capture not available in this test");
            case "toString" -> "fake capture mixer " + info.getName();
            case "hashCode" -> System.identityHashCode(proxy);
            case "equals" -> proxy == args[0];
            default -> throw new UnsupportedOperationException(m.getName());
        };
        return (Mixer) Proxy.newProxyInstance(FakeSound.class.getClassLoader(), new Class<?>[] {Mixer.class}, h);
    }

    /**
     * A playback line. {@code writeResult} maps the length asked for by each write (in call order) to the
     * bytes it takes; {@code drain} returns at once (a server that died during the drain looks like this).
     */
    static final class Line16 {
        final List<Integer> asked = new ArrayList<>();
        final List<String> calls = new ArrayList<>();
        private final IntUnaryOperator writeResult;
        private AudioFormat format;
        private int bufferBytes;

        Line16(IntUnaryOperator writeResult) {
            this.writeResult = writeResult;
        }

        SourceDataLine line() {
            InvocationHandler h = (proxy, m, args) -> {
                calls.add(m.getName());
                switch (m.getName()) {
                    case "open":
                        format = (AudioFormat) args[0];
                        bufferBytes = args.length > 1 ? (Integer) args[1] : 0;
                        return null;
                    case "getBufferSize":
                        return bufferBytes;
                    case "getFormat":
                        return format;
                    case "write":
                        int len = (Integer) args[2];
                        asked.add(len);
                        return writeResult.applyAsInt(asked.size() - 1) < 0 ? len
                                : Math.min(len, writeResult.applyAsInt(asked.size() - 1));
                    case "start", "stop", "flush", "close", "drain":
                        return null;
                    case "isOpen", "isRunning", "isActive":
                        return true;
                    case "toString":
                        return "fake line";
                    case "hashCode":
                        return System.identityHashCode(proxy);
                    case "equals":
                        return proxy == args[0];
                    default:
                        throw new UnsupportedOperationException(m.getName());
                }
            };
            return (SourceDataLine) Proxy.newProxyInstance(FakeSound.class.getClassLoader(),
                    new Class<?>[] {SourceDataLine.class}, h);
        }
    }
}
