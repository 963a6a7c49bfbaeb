package @PACKAGE@;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.ReaderRegistry;

class @READER@Test {

    @TempDir
    Path dir;

    @Test
    void contributedThroughTheExtensionPointAndChosenByContent() throws Exception {
        ReaderRegistry registry = ReaderRegistry.fromExtensionRegistry(RegistryFactory.getRegistry());
        // named .csv on purpose: the content decides, not the name
        Path file = Files.writeString(dir.resolve("export.csv"), @READER@.HEADER + "\n");
        assertEquals("@BUNDLE@.reader", registry.choose(file).contribution().id());
    }

    @Test
    void leavesOtherFilesToOtherReaders() {
        byte[] head = "##TITLE=a JCAMP-DX file\n".getBytes(StandardCharsets.ISO_8859_1);
        assertFalse(new @READER@().recognise(head, "x.jdx").recognised());
    }
}
