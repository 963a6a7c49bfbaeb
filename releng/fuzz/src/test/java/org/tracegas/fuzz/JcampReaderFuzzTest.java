package org.tracegas.fuzz;

import java.nio.charset.StandardCharsets;

import com.code_intelligence.jazzer.junit.DictionaryEntries;
import com.code_intelligence.jazzer.junit.FuzzTest;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.jcamp.JcampReader;

/**
 * Any text given to the JCAMP-DX reader must end in a result or an ImportException: any other exception or a
 * hang is a defect. Seeds are the hand-written files of the importer tests (JcampReaderFuzzTestInputs).
 */
class JcampReaderFuzzTest {

    private final JcampReader reader = new JcampReader();

    @FuzzTest(maxDuration = "60s")
    @DictionaryEntries({"##TITLE=", "##JCAMP-DX=4.24", "##JCAMP-DX=5.01", "##DATA TYPE=INFRARED SPECTRUM",
            "##DATA TYPE=INTERFEROGRAM", "##DATA TYPE=LINK", "##BLOCKS=", "##BLOCK_ID=", "##XUNITS=1/CM",
            "##XUNITS=MICROMETERS", "##XUNITS=POINTS", "##XUNITS=CM", "##YUNITS=ABSORBANCE",
            "##YUNITS=TRANSMITTANCE", "##XFACTOR=", "##YFACTOR=", "##FIRSTX=", "##LASTX=", "##DELTAX=",
            "##NPOINTS=", "##XYDATA=(X++(Y..Y))", "##XYPOINTS=(XY..XY)", "##PEAK TABLE=(XY..XY)",
            "##$LASER WAVENUMBER=", "##$SAMPLING INTERVAL=", "##END=", "$$", "E+", "1E-6"})
    void readArbitraryText(byte[] data) {
        try {
            reader.read(new String(data, StandardCharsets.ISO_8859_1), "fuzz.jdx");
        } catch (ImportException expected) {
            // malformed input is reported, which is the wanted outcome
        }
    }
}
