package limen.audio;

/**
 * There is no audio device to open (none at all, none of the requested name, or the system refused to open
 * a line). The message says which and what to do instead, e.g. {@value Devices#NO_OUTPUT_MESSAGE}.
 */
public final class NoDeviceException extends Exception {

    private static final long serialVersionUID = 1L;

    public NoDeviceException(String message) {
        super(message);
    }

    public NoDeviceException(String message, Throwable cause) {
        super(message, cause);
    }
}
