package limen.ui.booth;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Consumer;

import limen.audio.Devices;
import limen.audio.JavaSoundOutput;
import limen.audio.NoDeviceException;
import limen.audio.NoOutput;
import limen.audio.TrialOutput;
import limen.audio.WavFolderOutput;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;
import limen.model.validation.BatteryValidator;
import limen.model.validation.Problem;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.Responder;
import limen.session.SessionControl;
import limen.session.SessionFolder;
import limen.session.SessionListener;
import limen.session.SessionRunner;
import limen.session.SessionStatusInfo;

/**
 * The booth's wiring of the core session runner (the same steps as {@code ./limen run}): create or open the
 * session folder, open the chosen output, run on a background thread, report the end. No session logic here.
 */
public final class BoothSession {

    /** Where the sound goes. */
    public enum OutputKind {
        NONE("No sound (dry run)"), WAV_FOLDER("WAV files in a folder"), SOUND_DEVICE("Sound device");

        private final String label;

        OutputKind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * The output chosen in the console.
     *
     * @param wavFolder  for {@link OutputKind#WAV_FOLDER}
     * @param deviceName for {@link OutputKind#SOUND_DEVICE} (null: the system default)
     */
    public record OutputChoice(OutputKind kind, Path wavFolder, String deviceName, boolean realtime) {

        /** One line for the session header. */
        public String describe() {
            return switch (kind) {
                case NONE -> "none";
                case WAV_FOLDER -> "wav:" + wavFolder;
                case SOUND_DEVICE -> "javax.sound" + (deviceName != null ? " (" + deviceName + ")" : "");
            };
        }

        /** Opens the output for a session at the calibration's sample rate. */
        public TrialOutput open(int sampleRateHz, SplittableRandom dither) throws NoDeviceException, IOException {
            return switch (kind) {
                case NONE -> new NoOutput(realtime);
                case WAV_FOLDER -> new WavFolderOutput(Files.createDirectories(wavFolder), 24, realtime, dither);
                case SOUND_DEVICE -> JavaSoundOutput.open(Devices.system(), deviceName, sampleRateHz,
                        JavaSoundOutput.DEFAULT_BUFFER_MILLIS, dither);
            };
        }
    }

    private final SessionRunner runner;
    private final Thread thread;

    private BoothSession(SessionRunner runner, Thread thread) {
        this.runner = runner;
        this.thread = thread;
    }

    /**
     * Loads and checks a battery with its calibration (the one given, or the one the battery names).
     *
     * @throws IllegalArgumentException with the battery's errors when it has any
     */
    public static Loaded load(Path batteryFile, Path calibrationFile) throws LimenFileException {
        Battery b = LimenFiles.loadBattery(batteryFile);
        Path cal = calibrationFile;
        if (cal == null) {
            if (b.getCalibrationFile() == null || b.getCalibrationFile().isBlank()) {
                throw new IllegalArgumentException(batteryFile + ": the battery names no calibration: choose one");
            }
            cal = batteryFile.toAbsolutePath().getParent().resolve(b.getCalibrationFile()).normalize();
        }
        Calibration c = LimenFiles.loadCalibration(cal);
        List<Problem> errors = BatteryValidator.validate(b, c).stream().filter(Problem::isError).toList();
        if (!errors.isEmpty()) {
            StringBuilder sb = new StringBuilder(batteryFile.getFileName() + " has " + errors.size()
                    + " errors (see the battery check):");
            errors.stream().limit(5).forEach(p -> sb.append("\n").append(p.code()).append(": ").append(p.message()));
            throw new IllegalArgumentException(sb.toString());
        }
        return new Loaded(batteryFile, b, cal, c);
    }

    /** A checked battery and its calibration. */
    public record Loaded(Path batteryFile, Battery battery, Path calibrationFile, Calibration calibration) {

        /** The battery file's name without its extension (used in session folder names). */
        public String stem() {
            return batteryFile.getFileName().toString().replaceFirst("\\.battery$", "");
        }
    }

    /** Creates the session folder (status RUNNING) for a new session. */
    public static SessionFolder create(Path archive, Loaded loaded, String participant, long seed, OutputChoice output)
            throws IOException {
        return SessionFolder.create(archive, loaded.stem(), loaded.battery(), loaded.calibration(), participant, seed,
                output.describe(), -1);
    }

    /**
     * Starts (or continues) a session on a thread of its own.
     *
     * @param output   already open; closed when the session ends
     * @param screen   answers the trials; its indicators follow {@code play} through {@link IndicatedOutput}
     * @param onEnd    called on the session thread with how it ended
     * @param onError  called on the session thread when the runner failed (journal or header not writable)
     */
    public static BoothSession launch(SessionFolder folder, TrialOutput output, Responder screen,
            java.util.function.BiConsumer<limen.signal.CheckedStimulus, Long> soundStarting, boolean realtime,
            SessionListener listener, Consumer<SessionStatusInfo> onEnd, Consumer<Exception> onError) {
        TrialOutput indicated = soundStarting == null ? output : new IndicatedOutput(output, soundStarting);
        SessionRunner runner = SessionRunner.start(folder, indicated, screen,
                new BatteryTrialRenderer(CalibrationMapping.toSignal(folder.header().getCalibration())),
                new SessionControl(), realtime).addListener(listener);
        Thread t = new Thread(() -> {
            try (TrialOutput o = indicated) {
                onEnd.accept(runner.run());
            } catch (IOException | RuntimeException e) {
                onError.accept(e);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                onError.accept(e);
            }
        }, "limen-booth-session");
        t.setDaemon(true);
        t.start();
        return new BoothSession(runner, t);
    }

    public SessionControl control() {
        return runner.control();
    }

    public SessionFolder folder() {
        return runner.folder();
    }

    public boolean running() {
        return thread.isAlive();
    }

    /** Waits for the session thread (tests, shutdown). */
    public boolean join(long millis) throws InterruptedException {
        thread.join(millis);
        return !thread.isAlive();
    }
}
