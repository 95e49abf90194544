package limen.ui.analysis;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import limen.model.SessionHeader;
import limen.session.ArchiveIndex;
import limen.session.SessionFolder;
import limen.session.journal.JournalContents;
import limen.session.journal.JournalRow;
import limen.session.refit.SessionRefit;

/**
 * One session as the archive browser lists it: what its header says and what the journal reader found
 * (the integrity verdict of {@link limen.session.journal.JournalReader}, checked against the seal when there
 * is one, and the number of verified trials). Immutable.
 *
 * @param archive     the archive folder it was found under
 * @param folder      the session folder
 * @param participant the participant's pseudonym ("" when the header is unreadable)
 * @param battery     the battery's title
 * @param started     the start time, or null
 * @param status      the header's status literal
 * @param trials      the number of verified journal rows
 * @param integrity   the journal verdict's name, or {@link SessionRefit#UNREADABLE}
 * @param problem     what was wrong reading it, "" when nothing
 */
public record SessionEntry(Path archive, Path folder, String participant, String battery, Instant started, String status,
        int trials, String integrity, String problem) {

    /** Reads one session folder; never throws for a bad session (it is listed as unreadable). */
    public static SessionEntry read(Path archive, Path folder) {
        SessionHeader h;
        try {
            h = SessionFolder.open(folder).header();
        } catch (IOException | RuntimeException e) {
            return new SessionEntry(archive, folder, "", "", null, "", 0, SessionRefit.UNREADABLE, String.valueOf(e.getMessage()));
        }
        String participant = h.getParticipant() == null ? "" : h.getParticipant();
        String battery = h.getBattery() == null || h.getBattery().getTitle() == null ? "" : h.getBattery().getTitle();
        String status = h.getStatus() == null ? "" : h.getStatus().getLiteral();
        try {
            JournalContents j = SessionFolder.open(folder).readJournal();
            List<JournalRow> rows = j.rows();
            return new SessionEntry(archive, folder, participant, battery, h.getStartTime(), status, rows.size(),
                    j.integrity().name(), String.join("; ", j.problems()));
        } catch (IOException | RuntimeException e) {
            return new SessionEntry(archive, folder, participant, battery, h.getStartTime(), status, 0, SessionRefit.UNREADABLE,
                    String.valueOf(e.getMessage()));
        }
    }

    /** @return every session under an archive folder (any depth), in path order */
    public static List<SessionEntry> scan(Path archive) throws IOException {
        List<SessionEntry> out = new ArrayList<>();
        for (Path p : ArchiveIndex.sessions(archive)) {
            out.add(read(archive, p));
        }
        return out;
    }

    /** @return whether the journal verifies (OK, or a torn last row after verified rows), so it can be refitted */
    public boolean refittable() {
        return integrity.equals("OK") || integrity.equals("TORN_TAIL");
    }

    /** @return the session folder's name */
    public String name() {
        return folder.getFileName().toString();
    }
}
