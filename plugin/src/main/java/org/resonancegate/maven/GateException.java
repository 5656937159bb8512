package org.resonancegate.maven;

/**
 * A run that cannot go on: broken configuration, a spec directory that cannot be listed, a report
 * that cannot be written. The message is the whole sentence a user reads (it names the parameter
 * or file and says what to do); the goals turn it into a build error.
 */
class GateException extends Exception {

    private static final long serialVersionUID = 1L;

    GateException(String message) {
        super(message);
    }

    GateException(String message, Throwable cause) {
        super(message, cause);
    }
}
