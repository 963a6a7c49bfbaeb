package org.tracegas.importer.container;

import org.tracegas.spectrum.Interferogram;

/**
 * One interferogram of a container file.
 *
 * @param number 1-based position of the record in the file
 */
public record ContainerRecord(long number, AcquisitionHeader header, Interferogram interferogram) {

    public ContainerRecord {
        if (number < 1 || header == null || interferogram == null) {
            throw new IllegalArgumentException("number must be positive and header and interferogram given");
        }
        if (header.zpdIndex() >= interferogram.size()) {
            throw new IllegalArgumentException("zpdIndex " + header.zpdIndex() + " lies outside the "
                    + interferogram.size() + " samples");
        }
    }
}
