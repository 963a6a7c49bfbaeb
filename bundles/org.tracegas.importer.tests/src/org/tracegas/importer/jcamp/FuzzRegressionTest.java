package org.tracegas.importer.jcamp;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.tracegas.importer.ImportException;

/**
 * Inputs in fuzz-regressions/ once ended in an exception other than ImportException or in a hang; each must now
 * end in an ImportException within a few seconds.
 */
class FuzzRegressionTest {

    static List<String> inputs() throws IOException {
        try (InputStream in = FuzzRegressionTest.class.getResourceAsStream("fuzz-regressions/index.txt")) {
            List<String> names = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines()
                    .filter(l -> !l.isBlank() && !l.startsWith("#")).toList();
            assertFalse(names.isEmpty());
            return names;
        }
    }

    @ParameterizedTest
    @MethodSource("inputs")
    void endsInImportExceptionQuickly(String name) throws IOException {
        String text;
        try (InputStream in = getClass().getResourceAsStream("fuzz-regressions/" + name)) {
            text = new String(in.readAllBytes(), StandardCharsets.ISO_8859_1);
        }
        JcampReader reader = new JcampReader();
        assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> assertThrows(ImportException.class, () -> reader.read(text, name)));
    }
}
