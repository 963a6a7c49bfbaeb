package org.tracegas.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
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
