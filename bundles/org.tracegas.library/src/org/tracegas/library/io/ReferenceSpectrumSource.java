package org.tracegas.library.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;

import org.tracegas.spectrum.Spectrum;

/** Reads the absorbance spectrum of one reference from a file of some format. */
public interface ReferenceSpectrumSource {

    /**
     * @return an absorbance spectrum
     * @throws FileFormatException if the file does not follow the format (naming file, line and field)
     * @throws IOException         if the file cannot be read
     */
    Spectrum read(Path file) throws IOException;

    /**
     * What the file itself says of the reference, under the manifest's keys (compound, cas, ppm-m,
     * temperature in K, pressure in kPa, ...): a manifest block may leave out any key the file states. A value
     * the block gives wins over the file's.
     *
     * @throws FileFormatException if the file does not follow the format
     * @throws IOException         if the file cannot be read
     */
    default Map<String, String> conditions(Path file) throws IOException {
        return Map.of();
    }
}
