package org.tracegas.qa.campaign.internal;

import java.io.IOException;

import org.tracegas.qa.campaign.BandArea;
import org.tracegas.qa.checks.CtsBand;
import org.tracegas.qa.checks.QaInputs;
import org.tracegas.qa.checks.QaReading;
import org.tracegas.qa.checks.QaReference;
import org.tracegas.qa.checks.QaSettings;

/**
 * The band of the calibration transfer standard in the method's reference and in a CTS reading, from the plan's
 * cts-compound, cts-ppm and cts-band: what both CTS checks compare.
 */
final class CtsBands {

    private final double ppm;
    private final double low;
    private final double high;
    private final CtsBand reference;

    /** @throws IOException if a setting is malformed or the library holds no reference of the CTS gas */
    CtsBands(QaInputs inputs) throws IOException {
        QaSettings s = inputs.settings();
        double[] band = s.range("cts-band");
        this.ppm = s.number("cts-ppm");
        this.low = band[0];
        this.high = band[1];
        double path = inputs.nominalPathMetres();
        // the reference nearest in amount to the CTS gas in the cell, so that saturation does not bias the ratio
        QaReference r = inputs.reference(s.text("cts-compound"), ppm * path);
        this.reference = new CtsBand(BandArea.of(r.spectrum(), low, high), r.ppmMetres() / path, r.temperatureK(),
                r.pressureKPa());
    }

    CtsBand reference() {
        return reference;
    }

    CtsBand measured(QaReading cts) {
        return new CtsBand(BandArea.of(cts.absorbance(), low, high), ppm, cts.cellTemperatureK(),
                cts.cellPressureKPa());
    }
}
