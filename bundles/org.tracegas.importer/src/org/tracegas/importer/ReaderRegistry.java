package org.tracegas.importer;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;

/**
 * The readers known to the application, and the choice of a reader for a file by content. Filled from the
 * extension point {@value #EXTENSION_POINT} in an Eclipse application, or by {@link #register} in plain Java.
 */
public final class ReaderRegistry {

    /** Fully qualified id of the extension point through which bundles contribute readers. */
    public static final String EXTENSION_POINT = "org.tracegas.importer.readers";

    private final List<ReaderContribution> contributions = new CopyOnWriteArrayList<>();

    /** An empty registry for plain-Java use. */
    public ReaderRegistry() {
    }

    /** The readers contributed to the running platform's extension registry. */
    public static ReaderRegistry fromPlatform() {
        IExtensionRegistry registry = RegistryFactory.getRegistry();
        if (registry == null) {
            throw new IllegalStateException("no extension registry is running; use fromExtensionRegistry or"
                    + " register readers directly");
        }
        return fromExtensionRegistry(registry);
    }

    /**
     * The readers contributed to an extension registry.
     *
     * @throws IllegalStateException naming the contributing bundle and the element when a contribution is
     *                               incomplete or its class cannot be created
     */
    public static ReaderRegistry fromExtensionRegistry(IExtensionRegistry registry) {
        ReaderRegistry result = new ReaderRegistry();
        for (IConfigurationElement element : registry.getConfigurationElementsFor(EXTENSION_POINT)) {
            String contributor = element.getContributor().getName();
            if (!"reader".equals(element.getName())) {
                throw new IllegalStateException("bundle " + contributor + " contributes an element <"
                        + element.getName() + "> to " + EXTENSION_POINT + "; only <reader> is allowed");
            }
            String id = element.getAttribute("id");
            try {
                Object reader = element.createExecutableExtension("class");
                if (!(reader instanceof ImportReader r)) {
                    throw new IllegalStateException("reader " + id + " of bundle " + contributor + ": class "
                            + element.getAttribute("class") + " does not implement " + ImportReader.class.getName());
                }
                result.register(id, element.getAttribute("name"), r);
            } catch (CoreException e) {
                throw new IllegalStateException("reader " + id + " of bundle " + contributor
                        + ": class " + element.getAttribute("class") + " cannot be created: " + e.getMessage(), e);
            }
        }
        return result;
    }

    /**
     * Adds a reader.
     *
     * @throws IllegalArgumentException if the id is already registered or an argument is blank
     */
    public ReaderRegistry register(String id, String name, ImportReader reader) {
        ReaderContribution c = new ReaderContribution(id, name, reader);
        synchronized (contributions) {
            if (find(id) != null) {
                throw new IllegalArgumentException("a reader with id " + id + " is already registered");
            }
            contributions.add(c);
        }
        return this;
    }

    /** The registered readers in registration order. */
    public List<ReaderContribution> contributions() {
        return List.copyOf(contributions);
    }

    /** The reader with this id, or null. */
    public ReaderContribution find(String id) {
        for (ReaderContribution c : contributions) {
            if (c.id().equals(id)) {
                return c;
            }
        }
        return null;
    }

    /**
     * The reader most confident that it can read the file; on equal confidence the one registered first.
     *
     * @throws ImportException if the file is empty or unreadable or no reader recognises it
     */
    public ReaderChoice choose(Path file) throws ImportException {
        byte[] head = head(file);
        String fileName = file.getFileName() == null ? "" : file.getFileName().toString();
        ReaderChoice best = null;
        List<String> reasons = new ArrayList<>();
        for (ReaderContribution c : contributions) {
            Recognition r = c.reader().recognise(head.clone(), fileName);
            reasons.add(c.id() + ": " + r.reason());
            if (r.recognised() && (best == null || r.confidence() > best.recognition().confidence())) {
                best = new ReaderChoice(c, r);
            }
        }
        if (best == null) {
            throw new ImportException(file.toString(), 0, "format",
                    "no registered reader recognises this file (" + String.join("; ", reasons) + ")");
        }
        return best;
    }

    /** Chooses a reader by content and reads the whole file with it. */
    public ImportedData read(Path file, ImportOptions options) throws ImportException {
        return choose(file).contribution().reader().read(file, options);
    }

    private static byte[] head(Path file) throws ImportException {
        try (InputStream in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(ImportReader.HEAD_BYTES);
            if (head.length == 0) {
                throw new ImportException(file.toString(), 0, "file", "is empty");
            }
            return Arrays.copyOf(head, head.length);
        } catch (IOException e) {
            throw new ImportException(file.toString(), 0, "file", "cannot be read: " + e.getMessage(), e);
        }
    }
}
