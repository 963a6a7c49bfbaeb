package org.tracegas.library.io;

import java.io.IOException;
import java.nio.file.Path;

import org.tracegas.spectrum.Spectrum;

/** Reads the absorbance spectrum of one reference from a file of some format. */
public interface ReferenceSpectrumSource {

    /**
     * @return an absorbance spectrum
     * @throws FileFormatException if the file does not follow the format (naming file, line and field)
     * @throws IOException         if the file cannot be read
     */
    Spectrum read(Path file) throws IOException;
}
