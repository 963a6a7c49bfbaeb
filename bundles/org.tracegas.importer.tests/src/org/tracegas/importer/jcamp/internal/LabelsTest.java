package org.tracegas.importer.jcamp.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class LabelsTest {

    @Test
    void spacesDashesSlashesUnderscoresAndCaseAreIgnored() {
        // IUPAC JCAMP-DX 4.24 (McDonald & Wilks 1988), label normalisation; from memory
        assertEquals("DELTAX", Labels.normalise("Delta_X"));
        assertEquals("JCAMPDX", Labels.normalise("JCAMP-DX"));
        assertEquals("PEAKTABLE", Labels.normalise("peak table"));
        assertEquals("XYDATA", Labels.normalise("XY/DATA"));
        assertEquals("$LASERWAVENUMBER", Labels.normalise("$LASER WAVENUMBER"));
    }
}
