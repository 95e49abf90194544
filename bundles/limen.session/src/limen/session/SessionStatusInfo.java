package limen.session;

import java.nio.file.Path;

import limen.model.SessionStatus;

/**
 * How a run ended.
 *
 * @param folder  the session folder in the archive
 * @param status  COMPLETED, ABORTED or INTERRUPTED (paused on device loss; resumable)
 * @param trials  trials in the journal
 * @param message why it ended, for people
 */
public record SessionStatusInfo(Path folder, SessionStatus status, long trials, String message) {
}
