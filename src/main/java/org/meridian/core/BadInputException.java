package org.meridian.core;

/**
 * A problem with what the user gave us: a file, a value or an option. Its message is one line
 * written for the researcher, naming the file, line and column or the option at fault, and the
 * command line turns it into {@code error: <message>} with exit code 2.
 */
public class BadInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public BadInputException(String message) {
        super(message);
    }

    public BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
