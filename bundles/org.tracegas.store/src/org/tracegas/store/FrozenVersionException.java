package org.tracegas.store;

/**
 * A method or library version is used by a result and can no longer change; make a new version with
 * {@link VersionService#revise} instead.
 */
public class FrozenVersionException extends StoreException {

    private static final long serialVersionUID = 1L;

    public FrozenVersionException(String versionId, int number) {
        super("version " + number + " (" + versionId + ") is frozen because a result uses it; revise it into a"
                + " new version instead");
    }
}
