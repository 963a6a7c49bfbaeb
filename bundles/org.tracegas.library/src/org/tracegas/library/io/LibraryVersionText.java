package org.tracegas.library.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;

/**
 * The text by which a workspace keeps a version of a library folder: the manifest text as it is, followed by a
 * {@value #FILES} section with the SHA-256 of every spectrum file the manifest names, in manifest order. Equal
 * text means the same manifest and byte for byte the same spectra, so a version pins the exact references.
 */
public final class LibraryVersionText {

    /** Header of the section of file digests. */
    public static final String FILES = "[file-sha256]";

    private LibraryVersionText() {
    }

    /**
     * @throws FileFormatException naming the manifest line of a spectrum file that cannot be read
     */
    public static String of(Path manifest) throws IOException {
        String text = Files.readString(manifest, StandardCharsets.UTF_8);
        StringBuilder s = new StringBuilder(text);
        if (!text.endsWith("\n")) {
            s.append('\n');
        }
        s.append('\n').append(FILES).append('\n');
        List<String> lines = text.lines().toList();
        Path folder = manifest.toAbsolutePath().getParent();
        for (int i = 0; i < lines.size(); i++) {
            String t = lines.get(i).strip();
            int eq = t.indexOf('=');
            if (t.startsWith("#") || eq < 1 || !t.substring(0, eq).strip().toLowerCase(Locale.ROOT).equals("file")) {
                continue;
            }
            String file = t.substring(eq + 1).strip();
            try {
                s.append(file).append(" = ").append(sha256(folder.resolve(file))).append('\n');
            } catch (NoSuchFileException e) {
                throw new FileFormatException(manifest, i + 1, "file", "no such file: " + folder.resolve(file));
            }
        }
        return s.toString();
    }

    private static String sha256(Path file) throws IOException {
        try (InputStream in = new DigestInputStream(Files.newInputStream(file), MessageDigest.getInstance("SHA-256"))) {
            in.transferTo(java.io.OutputStream.nullOutputStream());
            return HexFormat.of().formatHex(((DigestInputStream) in).getMessageDigest().digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
