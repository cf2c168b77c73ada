package org.shutline.io;

/**
 * A user's input cannot be read: the message names the file, and where known the
 * layer, feature and field, in words a user can act on. The command line prints the
 * message without a stack trace and exits with code 2.
 */
public class InputException extends Exception {
    public InputException(String message) {
        super(message);
    }

    public InputException(String message, Throwable cause) {
        super(message, cause);
    }
}
