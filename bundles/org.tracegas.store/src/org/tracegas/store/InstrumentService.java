package org.tracegas.store;

import java.util.List;
import java.util.Optional;

import org.tracegas.model.Instrument;

/**
 * The lab's instruments and which of them made a measurement. An instrument is identified by its name and serial
 * number; its optical figures are fixed once recorded, so a changed set-up (another cell, another aperture) is
 * recorded as another instrument and the measurements made before keep the figures they were made with. Which
 * instrument made a measurement is written with the measurement itself ({@link ProcessedSpectrum#instrumentId()},
 * stored by {@link BlockService}), bound under the measurement's audit record.
 */
public interface InstrumentService {

    /**
     * Records an instrument once: the stored one when an instrument of that name and serial number with the same
     * figures is stored already, else a new one (with its audit record).
     *
     * @param described name, serial number and figures (laser wavenumber in cm-1, maximum path difference in cm,
     *                  field-of-view half-angle in mrad or unset, cell path length in m); its id is not used
     * @return the stored instrument
     * @throws IllegalArgumentException naming the field that is missing, not positive or not finite
     * @throws StoreException           naming the figure that differs from the stored instrument of that name
     *                                  and serial number
     */
    Instrument record(Session actor, Instrument described);

    /** The instrument of that name and serial number, empty when there is none. */
    Optional<Instrument> find(Session actor, String name, String serialNumber);

    /** The lab's instruments, ordered by name and serial number. */
    List<Instrument> instruments(Session actor);
}
