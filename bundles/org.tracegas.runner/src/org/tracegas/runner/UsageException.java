package org.tracegas.runner;

/** The command line was wrong; the message says which argument and why. */
public class UsageException extends Exception {

    private static final long serialVersionUID = 1L;

    private final boolean showUsage;

    public UsageException(String message) {
        this(message, true);
    }

    /**
     * @param showUsage whether the command's usage helps; not when the arguments are well formed but name
     *                  something that is not there, such as a mistyped workspace folder
     */
    public UsageException(String message, boolean showUsage) {
        super(message);
        this.showUsage = showUsage;
    }

    public boolean showUsage() {
        return showUsage;
    }
}
