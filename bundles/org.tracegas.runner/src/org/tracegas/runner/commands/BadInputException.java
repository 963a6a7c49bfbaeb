package org.tracegas.runner.commands;

/** An input file or stored record is missing or malformed; the message names it (file, record, field). */
final class BadInputException extends Exception {

    private static final long serialVersionUID = 1L;

    BadInputException(String message) {
        super(message);
    }

    BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
