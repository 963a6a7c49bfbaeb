package org.tracegas.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.container.ContainerReader;
import org.tracegas.importer.container.ContainerRecord;
import org.tracegas.model.Instrument;
import org.tracegas.model.WorkspaceFactory;

/**
 * The instrument that acquired a campaign's container files, with the figures their records carry. A container
 * names no instrument, so the lab gives its name and serial number. Recorded once
 * ({@link org.tracegas.store.InstrumentService#record}) before the files are processed, its id goes with every
 * measurement of them into the block that stores it ({@link ProjectQuantification}).
 */
public final class ContainerInstrument {

    private ContainerInstrument() {
    }

    /**
     * The figures of the files' first records: the reference laser's wavenumber of the interferogram; the maximum
     * optical path difference, the longer side of the interferogram from its zero path difference times the
     * sample spacing; the cell path length of the header. The field of view is left unset: containers do not
     * carry it.
     *
     * @return an instrument not yet stored
     * @throws ImportException naming the file, its first record and the field that differs from the first file's,
     *                         or a file without records
     */
    public static Instrument describe(List<Path> files, String name, String serialNumber)
            throws ImportException, IOException {
        if (files.isEmpty()) {
            throw new IllegalArgumentException("files: at least one container file is needed");
        }
        Instrument described = null;
        for (Path file : files) {
            ContainerRecord first;
            try (ContainerReader reader = ContainerReader.open(file)) {
                first = reader.readNext();
            }
            if (first == null) {
                throw new ImportException(file.toString(), 0, "record", "the file holds no acquisition");
            }
            Instrument i = figures(first, name, serialNumber);
            if (described == null) {
                described = i;
            } else {
                same(file, first, "laser.wavenumber", described.getLaserWavenumber(), i.getLaserWavenumber());
                same(file, first, "zpd.index", described.getMaxPathDifference(),
                        i.getMaxPathDifference());
                same(file, first, "path.length.m", described.getCellPathLength(), i.getCellPathLength());
            }
        }
        return described;
    }

    private static Instrument figures(ContainerRecord r, String name, String serialNumber) {
        Instrument i = WorkspaceFactory.eINSTANCE.createInstrument();
        i.setName(name);
        i.setSerialNumber(serialNumber);
        i.setLaserWavenumber(r.interferogram().laserWavenumber());
        int zpd = r.header().zpdIndex();
        int longerSide = Math.max(zpd, r.interferogram().size() - 1 - zpd);
        i.setMaxPathDifference(longerSide * r.interferogram().sampleSpacingCm());
        i.setCellPathLength(r.header().pathLengthM());
        return i;
    }

    private static void same(Path file, ContainerRecord r, String field, double first, double here)
            throws ImportException {
        if (first != here) {
            throw new ImportException(file.toString(), r.number(), field, "gives " + here + ", the first file "
                    + first + ": the files were acquired with different set-ups");
        }
    }
}
