package org.tracegas.demo;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.tracegas.report.campaign.WholeFile;
import org.tracegas.library.io.PartitionTableText;
import org.tracegas.library.synthesis.AbsorptionPath;
import org.tracegas.library.synthesis.HitranLineListReader;
import org.tracegas.library.synthesis.LineByLineModel;
import org.tracegas.library.synthesis.PartitionFunction;
import org.tracegas.library.synthesis.PublishedMolecularConstants;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

/**
 * The line-by-line models of the demo gases, read from their invented line lists: the optical depths that
 * make the demo's interferograms and the synthetic references of its library come from the same physics.
 */
public final class DemoPhysics {

    /** Length of the fine cosine transform: a grid step of about 0.015 cm-1 resolves the line shapes. */
    static final int TRANSFORM_LENGTH = 1 << 19;
    private static final double FINE_LOW = 600.0;
    private static final double FINE_HIGH = 3949.0;

    private final Map<String, LineByLineModel> models = new LinkedHashMap<>();
    private final Path lineListFolder;

    private DemoPhysics(Path lineListFolder) {
        this.lineListFolder = lineListFolder;
    }

    /** The folder of the line lists the models were read from. */
    Path lineListFolder() {
        return lineListFolder;
    }

    /**
     * Writes the invented line lists and the Q(T) tables of the gases into a folder and reads them back into
     * line-by-line models, as the library plan reads them: the tables hold Q from the published molecular
     * constants in 2 K steps over 200-700 K (within 0.3 % of TIPS-2021 over 250-500 K in the ratio to 296 K).
     */
    public static DemoPhysics fromInventedLineLists(Path folder) throws IOException {
        DemoPhysics physics = new DemoPhysics(folder);
        HitranLineListReader reader = new HitranLineListReader();
        for (Gas gas : DemoScenario.GASES) {
            Path file = InventedLineLists.write(gas, folder);
            Path table = folder.resolve(partitionTableName(gas));
            PartitionFunction q = PublishedMolecularConstants.forFormula(gas.formula()).orElseThrow(
                    () -> new IllegalStateException("no published constants for demo gas " + gas.formula()));
            WholeFile.write(table, stream -> stream.write(PartitionTableText.of(q, 200, 700, 2)
                    .getBytes(StandardCharsets.US_ASCII)));
            physics.models.put(gas.name(), new LineByLineModel(reader.read(file), gas.molarMass(),
                    PartitionTableText.read(table)));
        }
        return physics;
    }

    /** File name of the Q(T) table of a gas, beside its line list. */
    static String partitionTableName(Gas gas) {
        return gas.name().toLowerCase(Locale.ROOT) + "-q.txt";
    }

    static double fineStep() {
        return DemoScenario.LASER_WAVENUMBER / DemoScenario.SAMPLING_INTERVAL / TRANSFORM_LENGTH;
    }

    static int fineFirstIndex() {
        return (int) Math.ceil(FINE_LOW / fineStep());
    }

    /** Builds the synthesizer of the demo instrument's interferograms. */
    InterferogramSynthesizer interferograms() {
        double step = fineStep();
        int first = fineFirstIndex();
        int count = (int) Math.floor(FINE_HIGH / step) - first + 1;
        SpectralAxis fine = SpectralAxis.uniform(AxisUnit.WAVENUMBER, first * step, step, count);
        double[] envelope = new double[count];
        for (int i = 0; i < count; i++) {
            envelope[i] = sourceAndDetector(fine.get(i));
        }
        Map<String, double[]> depthPerPpm = new LinkedHashMap<>();
        for (Gas gas : DemoScenario.GASES) {
            double level = gas.nominalPpm() > 0 ? gas.nominalPpm() : 1.0;
            AbsorptionPath path = new AbsorptionPath(DemoScenario.CELL_TEMPERATURE, DemoScenario.CELL_PRESSURE, level,
                    DemoScenario.PATH_LENGTH);
            double[] depth = models.get(gas.name()).opticalDepth(fine, path).toArray();
            for (int i = 0; i < depth.length; i++) {
                depth[i] /= level;
            }
            depthPerPpm.put(gas.name(), depth);
        }
        return new InterferogramSynthesizer(TRANSFORM_LENGTH, first, envelope, depthPerPpm,
                DemoScenario.interferogramPoints() / 2);
    }

    /**
     * Single beam of the empty cell: a grey-body source seen by a detector that cuts on near 680 cm-1 and a
     * filter that cuts off below the folding wavenumber, so nothing folds back into the spectrum.
     */
    static double sourceAndDetector(double wavenumber) {
        double planck = wavenumber * wavenumber * wavenumber / Math.expm1(1.438776877 * wavenumber / 1250.0);
        double cutOn = 1.0 / (1.0 + Math.exp(-(wavenumber - 680.0) / 15.0));
        double cutOff = 1.0 / (1.0 + Math.exp((wavenumber - 3920.0) / 8.0));
        return 1e-8 * planck * cutOn * cutOff;
    }
}
