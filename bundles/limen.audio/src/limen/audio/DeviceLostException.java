package limen.audio;

/**
 * An output stopped working in the middle of a session: the sound server died (a short write on a running
 * line), the line was taken away, or a WAV file could not be written. The trial in hand was not fully output;
 * the runner pauses, keeps what it recorded and can resume on a new output.
 */
public final class DeviceLostException extends Exception {

    private static final long serialVersionUID = 1L;

    public DeviceLostException(String message) {
        super(message);
    }

    public DeviceLostException(String message, Throwable cause) {
        super(message, cause);
    }
}
