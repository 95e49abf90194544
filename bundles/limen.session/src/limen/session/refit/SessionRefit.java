package limen.session.refit;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

/**
 * The refit of one stored session: what its header says, the verdict on its journal and one
 * {@link TrackFit} per step and track. A session whose header cannot be read, or whose journal is edited,
 * truncated or malformed, has no track fits and says why in {@code problem}.
 *
 * @param folder      the session folder
 * @param participant the participant's pseudonym ("" when the header is unreadable)
 * @param battery     the battery's title ("" when unknown)
 * @param started     when the session started, or null
 * @param status      the session status from the header ("" when unreadable)
 * @param integrity   the journal verdict: a {@link limen.session.journal.JournalContents.Integrity} name, or
 *                    {@value #UNREADABLE}
 * @param problem     why the session was skipped, "" when it was refitted
 * @param tracks      the track fits, empty when skipped
 */
public record SessionRefit(Path folder, String participant, String battery, Instant started, String status,
        String integrity, String problem, List<TrackFit> tracks) {

    /** Integrity of a session whose header or journal cannot be read at all. */
    public static final String UNREADABLE = "UNREADABLE";

    public SessionRefit {
        tracks = List.copyOf(tracks);
    }

    /** @return whether the session was left out (unreadable or tampered) */
    public boolean skipped() {
        return !problem.isEmpty();
    }
}
