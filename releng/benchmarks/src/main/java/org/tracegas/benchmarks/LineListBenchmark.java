package org.tracegas.benchmarks;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.tracegas.library.Compound;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.LineList;
import org.tracegas.library.synthesis.PowerLawPartitionFunction;
import org.tracegas.library.synthesis.ReferenceSynthesizer;
import org.tracegas.library.synthesis.SpectralLine;
import org.tracegas.library.synthesis.SynthesisRequest;
import org.tracegas.preprocess.Apodization;
import org.tracegas.preprocess.InstrumentLineShape;
import org.tracegas.quantify.AnalysisRegion;
import org.tracegas.quantify.Analyte;
import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.FitAlgorithm;
import org.tracegas.quantify.PreparedMethod;
import org.tracegas.quantify.QuantificationMethod;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.ReferenceSpectrum;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.ShiftTerm;
import org.tracegas.quantify.linelist.LineListAlgorithm;
import org.tracegas.quantify.linelist.LineListSetup;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * One spectrum fitted from line lists against the same spectrum fitted by curve of growth, in one run: two invented
 * gases with overlapping bands in 2100-2200 cm-1 (about 30 strong lines and 120 weaker ones), 0.5 cm-1 resolution,
 * 0.25 cm-1 points, one region with a linear baseline, the wavenumber scale fitted. The curve of growth's
 * references (three amounts per gas) and the line-list fit's fine grid are prepared in the setup; each call fits
 * every analyte of one spectrum. The sample is the sum of each gas's synthetic absorbance alone plus a baseline and
 * noise: for timing, not for accuracy. The line-list fit at measured cell conditions is timed at conditions that
 * change with every sample: each fit interpolates the optical depths to its own conditions, and every 50th also
 * computes the line-by-line spectra at the corners of a new cell of conditions.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class LineListBenchmark {

    private static final SpectralAxis AXIS = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2090.0, 0.25, 481);
    private static final double TEMPERATURE = 303.0;
    private static final double PRESSURE = 100.4;
    private static final double PATH = 7.5;
    private static final double RESOLUTION = 0.5;
    private static final double[] HIGHEST = {1000, 2500};

    private Quantifier lineList;
    private Quantifier atMeasuredConditions;
    private Quantifier curveOfGrowth;
    private Sample sample;
    private int call;

    @Setup
    public void setUp() {
        List<LineByLineModel> models = List.of(band(28, 3.7, 14, 8e-20, 2151), band(44, 0.9, 60, 2e-21, 2158));
        List<String> names = List.of("GA", "GB");
        Map<String, LineByLineModel> byName = Map.of(names.get(0), models.get(0), names.get(1), models.get(1));
        LineListSetup setup = new LineListSetup(byName, TEMPERATURE, PRESSURE,
                InstrumentLineShape.forResolution(Apodization.NORTON_BEER_MEDIUM, RESOLUTION), 0.006);
        QuantificationMethod.Builder b = QuantificationMethod.builder("two gases").pathLengthMetres(PATH)
                .maxAbsorbance(3).shiftTerm(ShiftTerm.SCALE);
        List<AnalysisRegion> regions = List.of(AnalysisRegion.of(2100, 2200, 1));
        b.analyte(new Analyte(names.get(0), List.of(names.get(1)), regions));
        b.analyte(new Analyte(names.get(1), List.of(names.get(0)), regions));
        double[] mixture = new double[AXIS.size()];
        Random random = new Random(1996);
        for (int g = 0; g < 2; g++) {
            ReferenceSynthesizer synthesizer = new ReferenceSynthesizer(models.get(g),
                    new Compound(names.get(g), g == 0 ? "10-00-4" : "20-00-8", "X", g == 0 ? 28 : 44));
            for (double f : new double[] {0.25, 0.5, 1}) {
                b.reference(new ReferenceSpectrum(names.get(g), synthesize(synthesizer, f * HIGHEST[g]),
                        f * HIGHEST[g]));
            }
            double[] own = synthesize(synthesizer, 0.6 * HIGHEST[g]).toArray();
            for (int i = 0; i < mixture.length; i++) {
                mixture[i] += own[i] + (g == 0 ? 0.01 + 4e-4 * random.nextGaussian() : 0);
            }
        }
        sample = Sample.of(new Spectrum(AXIS, mixture, Ordinate.ABSORBANCE));
        curveOfGrowth = quantifier(b.algorithm(FitAlgorithm.CURVE_OF_GROWTH).build());
        lineList = quantifier(b.algorithm(new LineListAlgorithm(setup)).build());
        atMeasuredConditions = quantifier(b.algorithm(new LineListAlgorithm(new LineListSetup(byName, TEMPERATURE,
                PRESSURE, setup.lineShape(), setup.fieldOfView(), true))).build());
    }

    /** An invented band: lines spaced evenly about a centre, Boltzmann-like envelope. */
    private static LineByLineModel band(double molarMass, double spacing, int half, double strength, double centre) {
        List<SpectralLine> lines = new ArrayList<>();
        for (int m = -half; m <= half; m++) {
            if (m != 0) {
                double e = 2.0 * Math.abs(m) * (Math.abs(m) + 1) * 14 / (half * half);
                lines.add(new SpectralLine(90, 1, centre + spacing * m, strength * Math.abs(m) * Math.exp(-e / 2),
                        1, 0.07, 0.08, 100 * e, 0.7, -0.002));
            }
        }
        return new LineByLineModel(new LineList("invented band at " + centre, lines), molarMass,
                PowerLawPartitionFunction.linearMolecule());
    }

    private static Spectrum synthesize(ReferenceSynthesizer synthesizer, double ppmMetres) {
        return synthesizer.synthesize(new SynthesisRequest(new AbsorptionPath(TEMPERATURE, PRESSURE,
                ppmMetres / PATH, PATH), AXIS, Apodization.NORTON_BEER_MEDIUM, RESOLUTION, 0)).spectrum();
    }

    private static Quantifier quantifier(QuantificationMethod method) {
        return new Quantifier(PreparedMethod.prepare(method, AXIS), "library", "bench", false);
    }

    @Benchmark
    public List<CompoundResult> lineList() {
        return lineList.fit(sample);
    }

    /**
     * The line-list fit at each sample's measured cell conditions, every call at a temperature 0.01 K from the
     * previous one, so that each prepares the fit anew and every 50th enters a new 0.5 K cell of conditions: the
     * cost of a campaign whose cell temperature never repeats and drifts by half a kelvin every 50 spectra. The
     * temperature climbs over 10 K and starts again, so that every call sees the same conditions however many calls
     * an iteration makes (the fine grid, and so the cost, changes with the temperature), and 20 cells, more than
     * are kept, so that a cell is computed anew each time it comes back.
     */
    @Benchmark
    public List<CompoundResult> lineListAtNewConditions() {
        call++;
        return atMeasuredConditions.fit(sample.inCell(TEMPERATURE + 0.01 * (call % 1000), PRESSURE));
    }

    @Benchmark
    public List<CompoundResult> curveOfGrowth() {
        return curveOfGrowth.fit(sample);
    }
}
