package org.tracegas.runner;

/** The command line was wrong; the message says which argument and why. */
public class UsageException extends Exception {

    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message);
    }
}
