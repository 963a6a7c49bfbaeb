package org.tracegas.quantify.linelist.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;

class MixtureModelTest {

    private static final InstrumentLineShape LINE_SHAPE = InstrumentLineShape.forResolution(
            Apodization.NORTON_BEER_MEDIUM, 0.5);

    /** An invented band of strong lines 3.5 cm-1 apart around 2140 cm-1. */
    static LineByLineModel band() {
        List<SpectralLine> lines = new ArrayList<>();
        for (int m = -6; m <= 6; m++) {
            if (m != 0) {
                lines.add(new SpectralLine(90, 1, 2140 + 3.5 * m, 2e-19, 1, 0.065, 0.075, 50.0 * m * m, 0.7, 0));
            }
        }
        return new LineByLineModel(new LineList("invented", lines), 28, PowerLawPartitionFunction.linearMolecule());
    }

    private static double[] observe(MixtureModel m, double[] amounts) {
        double[] observed = new double[m.grid().size()];
        m.observe(amounts, new double[m.grid().size()], observed);
        return observed;
    }

    static MixtureModel model(double fieldOfView) {
        return new MixtureModel(List.of(band()), 300, 101.0, 5.0, LINE_SHAPE, fieldOfView, 2125, 2155);
    }

    /**
     * The field of view's boxcar against the physics it stands for: each ray at angle theta sees the line-shaped
     * spectrum stretched by 1 / cos(theta), and a uniformly lit circular beam spreads theta^2 evenly over
     * [0, alpha^2] (from memory); here 256 ray angles over the model without field of view, read by the cubic.
     * Agreement within 5e-4 in transmittance (3.1e-4 at the time of writing, beside lines down to 0.30), half the
     * noise of a minute's spectrum: both sides read the fine grid with the cubic, whose error is of that size at
     * the steepest flanks.
     */
    @Test
    void fieldOfViewIsTheAverageOverRayAngles() {
        double alpha = 0.01;
        MixtureModel point = model(0);
        MixtureModel wide = model(alpha);
        double[] amounts = {2500};
        double[] narrowSeen = observe(point, amounts);
        double[] wideSeen = observe(wide, amounts);
        CubicReader atPoint = new CubicReader(point.grid());
        CubicReader atWide = new CubicReader(wide.grid());
        double[] read = new double[2];
        double worst = 0;
        double deepest = 1;
        for (double nu = 2130; nu <= 2150; nu += 0.05) {
            double sum = 0;
            for (int a = 0; a < 256; a++) {
                double theta2 = alpha * alpha * (a + 0.5) / 256;
                atPoint.read(narrowSeen, nu / Math.cos(Math.sqrt(theta2)), read);
                sum += read[0];
            }
            atWide.read(wideSeen, nu, read);
            worst = Math.max(worst, Math.abs(sum / 256 - read[0]));
            deepest = Math.min(deepest, read[0]);
        }
        assertTrue(deepest < 0.5, "the band must saturate, lowest transmittance " + deepest);
        assertTrue(worst < 5e-4, "largest difference " + worst);
    }

    /** The derivatives with respect to the amounts are those of central differences of the transmittance. */
    @Test
    void derivativesAreThoseOfTheTransmittance() {
        MixtureModel m = model(0.006);
        double[] monochromatic = new double[m.grid().size()];
        double[] derivative = new double[m.grid().size()];
        m.observe(new double[] {500}, monochromatic, new double[m.grid().size()]);
        m.derivative(0, new double[] {500}, monochromatic, derivative);
        double h = 0.01;
        double[] up = observe(m, new double[] {500 + h});
        double[] down = observe(m, new double[] {500 - h});
        double largest = 0;
        for (int i = 0; i < up.length; i++) {
            largest = Math.max(largest, Math.abs(derivative[i]));
            assertEquals((up[i] - down[i]) / (2 * h), derivative[i], 1e-9, "fine point " + i);
        }
        assertTrue(largest > 1e-4, "the derivative must not vanish, largest " + largest);
    }

    /**
     * At zero amounts, where every fit starts and the model answers from spectra prepared once: the empty cell's
     * observed transmittance is the same at every fine point and 1 within 1e-4 (the line shape has unit area, and
     * the field of view's mean of a constant is the constant; the model's copy of the line shape, its response on
     * the fine grid, misses 3e-5 of it in the wings beyond the grid), and the derivatives are those of central
     * differences about zero.
     */
    @Test
    void atZeroAmountsTheCellIsClearAndTheSlopesThoseOfCentralDifferences() {
        MixtureModel m = model(0.006);
        double[] monochromatic = new double[m.grid().size()];
        double[] clear = new double[m.grid().size()];
        m.observe(new double[] {0}, monochromatic, clear);
        double[] derivative = new double[m.grid().size()];
        m.derivative(0, new double[] {0}, monochromatic, derivative);
        double h = 0.01;
        double[] up = observe(m, new double[] {h});
        double[] down = observe(m, new double[] {-h});
        double largest = 0;
        assertEquals(1, clear[0], 1e-4);
        for (int i = 0; i < clear.length; i++) {
            assertEquals(1, monochromatic[i], 0, "fine point " + i);
            assertEquals(clear[0], clear[i], 1e-12, "fine point " + i);
            largest = Math.max(largest, Math.abs(derivative[i]));
            assertEquals((up[i] - down[i]) / (2 * h), derivative[i], 1e-9, "fine point " + i);
        }
        assertTrue(largest > 1e-5, "the derivative must not vanish, largest " + largest);
    }

    /**
     * A model weighted from two others on one instrument sees, at zero amounts and at an amount, what a model
     * computed anew from the weighted optical depths sees: the instrument is linear in the optical depth at zero
     * amounts, so the weighted derivatives differ from those computed anew only by rounding.
     */
    @Test
    void aWeightedModelSeesWhatItsWeightedOpticalDepthsGive() {
        List<LineByLineModel> band = List.of(band());
        FineGridSpectrometer instrument = new FineGridSpectrometer(band, MixtureModel.nominal(300, 101, 5.0),
                LINE_SHAPE, 0.006, 2125, 2155);
        double[][] cool = MixtureModel.opticalDepthPerAmount(band, instrument.grid(), MixtureModel.nominal(300, 101,
                5.0));
        double[][] warm = MixtureModel.opticalDepthPerAmount(band, instrument.grid(), MixtureModel.nominal(340, 95,
                5.0));
        double[] weights = {0.3, 0.7};
        double[][] mixed = new double[1][cool[0].length];
        for (int i = 0; i < mixed[0].length; i++) {
            mixed[0][i] = weights[0] * cool[0][i] + weights[1] * warm[0][i];
        }
        MixtureModel weighted = MixtureModel.weighted(List.of(new MixtureModel(instrument, cool),
                new MixtureModel(instrument, warm)), weights);
        MixtureModel anew = new MixtureModel(instrument, mixed);
        int size = instrument.grid().size();
        for (double amount : new double[] {0, 800}) {
            double[] monochromatic = new double[size];
            double[] fromWeighted = new double[size];
            double[] fromAnew = new double[size];
            weighted.observe(new double[] {amount}, monochromatic, new double[size]);
            weighted.derivative(0, new double[] {amount}, monochromatic, fromWeighted);
            anew.observe(new double[] {amount}, monochromatic, new double[size]);
            anew.derivative(0, new double[] {amount}, monochromatic, fromAnew);
            double largest = 0;
            for (double d : fromAnew) {
                largest = Math.max(largest, Math.abs(d));
            }
            assertTrue(largest > 1e-5, "the derivative must not vanish, largest " + largest);
            for (int i = 0; i < size; i++) {
                assertEquals(fromAnew[i], fromWeighted[i], 1e-12 * largest, "amount " + amount + ", fine point " + i);
            }
        }
    }
}
