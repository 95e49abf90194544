package limen.session;

import java.io.IOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.regex.Pattern;

import org.eclipse.emf.ecore.util.EcoreUtil;

import limen.core.About;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.ExposureEstimate;
import limen.model.LimenFactory;
import limen.model.SessionHeader;
import limen.model.SessionStatus;
import limen.model.Step;
import limen.model.io.LimenFileException;
import limen.model.io.LimenFiles;
import limen.session.journal.Journal;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalReader;
import limen.session.journal.JournalWriter;
import limen.session.journal.SessionSeal;
import limen.signal.Exposure;
import limen.signal.ExposureCriterion;

/**
 * A session in an archive: a folder {@code ARCHIVE/PARTICIPANT/BATTERY-yyyyMMdd-HHmmss-XXXX/} holding the header
 * ({@code header.session}, XMI: battery and calibration snapshots, seed, step order, status, exposure), the
 * journal ({@code trials.csv}) and, once ended, the seal ({@code journal.seal}). Folder names are created with
 * an atomic {@code createDirectory} and a random suffix, so several booths can write into one shared archive.
 */
public final class SessionFolder {

    /** File name of the header inside a session folder. */
    public static final String HEADER_FILE = "header." + LimenFiles.SESSION_EXTENSION;

    private static final Pattern SAFE = Pattern.compile("[^A-Za-z0-9._-]+");
    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final Path path;
    private final SessionHeader header;

    private SessionFolder(Path path, SessionHeader header) {
        this.path = path;
        this.header = header;
    }

    /**
     * Creates a new session folder with its header (status RUNNING) and an empty journal.
     *
     * @param batteryName    used in the folder name (the battery file's stem)
     * @param latinSquareRow row of the counterbalancing design; negative to count the participants of this
     *                       battery already in the archive
     */
    public static SessionFolder create(Path archive, String batteryName, Battery battery, Calibration calibration,
            String participant, long seed, String device, int latinSquareRow) throws IOException {
        if (participant == null || participant.isBlank()) {
            throw new IllegalArgumentException("a session needs a participant pseudonym");
        }
        SessionHeader h = LimenFactory.eINSTANCE.createSessionHeader();
        h.setParticipant(participant);
        Battery snapshot = EcoreUtil.copy(battery);
        h.setBattery(snapshot);
        h.setCalibration(EcoreUtil.copy(calibration));
        h.setDevice(device);
        h.setRandomSeed(seed);
        h.setSoftwareVersion(About.current().bundleVersion());
        Instant now = Instant.now();
        h.setStartTime(now);
        h.setStatus(SessionStatus.RUNNING);
        int row = latinSquareRow >= 0 ? latinSquareRow : ArchiveIndex.participantsOf(archive, safe(batteryName), participant);
        if (snapshot.getOrdering() == limen.model.OrderingPolicy.LATIN_SQUARE) {
            h.setLatinSquareRow(row);
        }
        List<Step> order = StepOrder.order(snapshot, seed, row);
        h.getStepOrder().addAll(order);
        Path parent = Files.createDirectories(archive.resolve(safe(participant)));
        SplittableRandom suffix = new SplittableRandom(System.nanoTime() ^ seed);
        for (int attempt = 0; attempt < 100; attempt++) {
            Path candidate = parent.resolve(safe(batteryName) + "-" + STAMP.format(now) + "-"
                    + String.format(Locale.ROOT, "%04x", suffix.nextInt(0x10000)));
            try {
                Files.createDirectory(candidate);
            } catch (FileAlreadyExistsException e) {
                continue;
            }
            SessionFolder folder = new SessionFolder(candidate, h);
            folder.saveHeader();
            JournalWriter.create(candidate.resolve(Journal.FILE_NAME)).close();
            return folder;
        }
        throw new IOException("cannot create a unique session folder under " + parent);
    }

    /** Opens an existing session folder (for resume or analysis). */
    public static SessionFolder open(Path folder) throws IOException {
        Path file = folder.resolve(HEADER_FILE);
        if (!Files.isRegularFile(file)) {
            throw new IOException(folder + ": not a Limen session folder (no " + HEADER_FILE + ")");
        }
        try {
            return new SessionFolder(folder, LimenFiles.loadSession(file));
        } catch (LimenFileException e) {
            throw new IOException(e.getMessage(), e);
        }
    }

    static String safe(String name) {
        String s = SAFE.matcher(name).replaceAll("_");
        return s.isEmpty() ? "_" : s;
    }

    public Path path() {
        return path;
    }

    public SessionHeader header() {
        return header;
    }

    public Path journalFile() {
        return path.resolve(Journal.FILE_NAME);
    }

    /** Reads and verifies the journal against the seal, if any. */
    public JournalContents readJournal() throws IOException {
        return JournalReader.readAndCheckSeal(journalFile(), SessionSeal.read(path));
    }

    JournalWriter openJournalForAppend(JournalContents contents) throws IOException {
        if (!Files.exists(journalFile())) {
            return JournalWriter.create(journalFile());
        }
        return JournalWriter.resume(journalFile(), contents);
    }

    /** Writes the header atomically. */
    public void saveHeader() throws IOException {
        LimenFiles.save(header, path.resolve(HEADER_FILE));
    }

    private static double finiteOrZero(double v) {
        return Double.isFinite(v) ? v : 0;
    }

    private static double hundredths(double v) {
        return Double.isFinite(v) ? Math.round(v * 100) / 100.0 : 0;
    }

    /**
     * Stores the session's exposure estimate in the header: sound-on time, L_Aeq over it, the louder ear's daily
     * doses by NIOSH (1998) and OSHA 29 CFR 1910.95, and the highest level the guard measured (kept when higher
     * than the one stored before a resume).
     */
    void recordExposure(Exposure total, double peakDbSpl) {
        ExposureEstimate e = header.getExposure();
        if (e == null) {
            e = LimenFactory.eINSTANCE.createExposureEstimate();
            header.setExposure(e);
        }
        e.setSoundOnSeconds(total.durationSeconds());
        double leq = Math.max(total.leqDbA(0), total.leqDbA(1));
        e.setEquivalentLevelDbSpl(Double.isFinite(leq) ? Math.round(leq * 100) / 100.0 : 0);
        // doses unrounded: a research session's dose is often a few thousandths of a percent
        e.setNioshDosePercent(finiteOrZero(total.worstEarDosePercent(ExposureCriterion.NIOSH_1998)));
        e.setOshaDosePercent(finiteOrZero(total.worstEarDosePercent(ExposureCriterion.OSHA_1910_95)));
        if (Double.isFinite(peakDbSpl) && peakDbSpl > e.getPeakLevelDbSpl()) {
            e.setPeakLevelDbSpl(hundredths(peakDbSpl));
        }
    }
}
