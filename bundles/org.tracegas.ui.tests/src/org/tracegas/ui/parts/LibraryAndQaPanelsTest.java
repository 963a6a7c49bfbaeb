package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swtchart.Range;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.importer.jcamp.JcampWriter;
import org.tracegas.library.Compound;
import org.tracegas.library.Origin;
import org.tracegas.library.OriginKind;
import org.tracegas.library.ReferenceConditions;
import org.tracegas.library.ReferenceMetadata;
import org.tracegas.library.ReferenceSpectrum;
import org.tracegas.qa.checks.BackgroundAgeCheck;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.ui.Screens;

class LibraryAndQaPanelsTest {

    private Display display;
    private Shell shell;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(1000, 400);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    private static ReferenceSpectrum reference(String name, String cas, OriginKind kind, String text) {
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 1, 3), new double[] {0, 0.1, 0},
                Ordinate.ABSORBANCE);
        // CAS numbers of CO and N2O (from memory)
        return new ReferenceSpectrum(s, new ReferenceMetadata(new Compound(name, cas, name, 28.0),
                new ReferenceConditions(100, 296, 101.3, 0.5, "triangular"), new Origin(kind, text), 0.02));
    }

    @Test
    void syntheticReferencesAreMarkedAsSuch() throws Exception {
        LibraryBrowserPanel panel = new LibraryBrowserPanel(shell, SWT.NONE);
        panel.show("Stack library", List.of(reference("CO", "630-08-0", OriginKind.MEASURED, "cell 2026-01"),
                reference("N2O", "10024-97-2", OriginKind.SYNTHETIC, "line by line")));
        shell.open();
        assertEquals("Stack library: 2 reference spectra, 1 of them synthetic (computed, not measured)",
                panel.summary().getText());
        assertEquals("measured (cell 2026-01)", panel.table().getItem(0).getText(2));
        assertEquals("SYNTHETIC — line by line", panel.table().getItem(1).getText(2));
        assertEquals(Palette.CHANGED, panel.table().getItem(1).getBackground(2));
        Screens.save(shell, "library-browser");
    }

    /** A reference in a real JCAMP-DX file: an invented band at 2143 cm⁻¹ whose peak absorbance is {@code peak}. */
    private static Path jcamp(Path folder, String name, double peak) throws Exception {
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.5, 601);
        double[] a = new double[axis.size()];
        for (int k = 0; k < a.length; k++) {
            double x = (axis.get(k) - 2143) / 12;
            a[k] = peak / (1 + x * x);
        }
        Path file = folder.resolve(name);
        JcampWriter.save(JcampWriter.defaultPrecision().write(new Spectrum(axis, a, Ordinate.ABSORBANCE), name,
                Map.of()), file);
        return file;
    }

    private static String block(String file, String ppmM, String kelvin, String kPa) {
        // CAS number and molar mass of CO: NIST Chemistry WebBook (from memory)
        return "[reference]\nfile = " + file + "\ncompound = CO\ncas = 630-08-0\nformula = CO\nmolar-mass = 28.010\n"
                + "ppm-m = " + ppmM + "\ntemperature = " + kelvin + "\npressure = " + kPa + "\nresolution = 0.5\n"
                + "apodization = Norton-Beer medium\norigin = measured\nuncertainty = 0.02\n";
    }

    @Test
    void aLibraryFolderIsPreviewedAndTwoReferencesAreOverlaidWithTheConditionsInWhichTheyDiffer(@TempDir Path folder)
            throws Exception {
        // an invented lab's two CO references: one at room conditions, one in the heated cell
        jcamp(folder, "co-200.jdx", 0.5);
        jcamp(folder, "co-400-hot.jdx", 0.93);
        Path manifest = Files.writeString(folder.resolve("library.manifest"), "library = Quarrymoor CO\n\n"
                + block("co-200.jdx", "200", "296", "101.325") + "\n" + block("co-400-hot.jdx", "400", "318", "100.2"));
        LibraryBrowserPanel panel = new LibraryBrowserPanel(shell, SWT.NONE);
        shell.setSize(700, 600);
        shell.open();
        panel.open(manifest);
        Screens.waitFor(display, () -> panel.table().getItemCount() == 2, 30_000);
        assertEquals("Quarrymoor CO (folder " + folder + "): 2 reference spectra", panel.summary().getText());
        assertEquals("CO 200 ppm·m: 200 ppm·m in the path, 296 K, 101.325 kPa, resolution 0.5 cm⁻¹, apodization"
                + " Norton-Beer medium", panel.conditions().getText());

        panel.table().select(new int[] {0, 1});
        panel.table().notifyListeners(SWT.Selection, new Event());
        assertEquals("CO 200 ppm·m: 200 ppm·m in the path, 296 K, 101.325 kPa, resolution 0.5 cm⁻¹, apodization"
                + " Norton-Beer medium\nover it: CO 400 ppm·m: 400 ppm·m in the path, 318 K, 100.2 kPa, resolution"
                + " 0.5 cm⁻¹, apodization Norton-Beer medium\nThe two differ in temperature 296 K and 318 K;"
                + " pressure 101.325 kPa and 100.2 kPa.", panel.conditions().getText());
        assertEquals(2, panel.previewChart().getSeriesSet().getSeries().length);
        // the files' own peaks: the plot's absorbance scale reaches the taller band and not far beyond
        Range y = panel.previewChart().getAxisSet().getYAxis(0).getRange();
        assertTrue(y.upper >= 0.93 && y.upper < 1.05, y.toString());
        Range x = panel.previewChart().getAxisSet().getXAxis(0).getRange();
        assertEquals(2000, x.lower, 1e-9);
        assertEquals(2300, x.upper, 1e-9);
        Screens.save(shell, "library-preview-overlay");
    }

    @Test
    void aLibraryFolderWithAMissingSpectrumIsNamedAndNothingShown(@TempDir Path folder) throws Exception {
        Path manifest = Files.writeString(folder.resolve("library.manifest"), "library = Quarrymoor CO\n\n"
                + block("co-200.jdx", "200", "296", "101.325"));
        LibraryBrowserPanel panel = new LibraryBrowserPanel(shell, SWT.NONE);
        shell.open();
        panel.open(manifest);
        Screens.waitFor(display, () -> panel.summary().getText().startsWith("The library folder cannot be read"),
                30_000);
        assertTrue(panel.summary().getText().contains("co-200.jdx"), panel.summary().getText());
        assertEquals(0, panel.table().getItemCount());
    }

    @Test
    void qaOverviewListsPassAndFailWithTheRule() throws Exception {
        QaOverviewPanel panel = new QaOverviewPanel(shell, SWT.NONE);
        BackgroundAgeCheck check = new BackgroundAgeCheck(Duration.ofHours(1));
        Instant bg = Instant.parse("2026-03-10T07:20:00Z");
        CheckOutcome pass = check.evaluate(bg, bg.plusSeconds(40 * 60));
        CheckOutcome fail = check.evaluate(bg, bg.plusSeconds(110 * 60));
        panel.show(List.of(pass, fail));
        shell.open();
        assertEquals("2 checks: 1 passed, 1 failed", panel.summary().getText());
        assertEquals("pass", panel.table().getItem(0).getText(0));
        assertEquals("FAIL", panel.table().getItem(1).getText(0));
        assertEquals(fail.rule().statement(), panel.table().getItem(1).getText(4));
        assertEquals(Palette.FAIL, panel.table().getItem(1).getBackground());
        assertTrue(panel.table().getItem(1).getText(2).startsWith("1.833 h"), panel.table().getItem(1).getText(2));
        Screens.save(shell, "qa-overview");
    }
}
