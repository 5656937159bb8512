package org.resonancegate.baseline;

/**
 * The baseline cannot be read at all: no repository, an unknown revision, history missing from a
 * shallow clone. The message is written for the user and says what to do. A spec that does not
 * read at the baseline is not this: it is reported in the comparison.
 */
public final class BaselineException extends Exception {

    private static final long serialVersionUID = 1L;

    BaselineException(String message) {
        super(message);
    }

    BaselineException(String message, Throwable cause) {
        super(message, cause);
    }
}
