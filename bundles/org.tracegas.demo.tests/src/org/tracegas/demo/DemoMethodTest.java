package org.tracegas.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.method.LibraryPlan;
import org.tracegas.method.MethodDefinition;
import org.tracegas.qa.campaign.QaPlan;
import org.tracegas.report.campaign.ReportPlan;
import org.tracegas.preprocess.Apodization;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.SpectralAxis;

/** The demo's plans are files the runner's commands read, with the demo's own numbers. */
class DemoMethodTest {

    @TempDir
    Path folder;

    private Path write(String name, String text) throws Exception {
        return Files.writeString(folder.resolve(name), text, StandardCharsets.UTF_8);
    }

    @Test
    void plansReadBackWithTheDemoNumbers() throws Exception {
        MethodDefinition method = MethodDefinition.read(write("demo.method", DemoMethod.methodText()));
        assertEquals(DemoMethod.METHOD_NAME, method.name());
        assertEquals(9, method.analytes().size(), "8 gases of the stack and the tracer");
        assertTrue(method.name().contains(method.analytes().size() + " analytes"), "the title counts them: "
                + method.name());
        assertEquals(folder.resolve("library/library.manifest"), method.libraryManifest());
        assertEquals(DemoScenario.PATH_LENGTH, method.pathLengthM());
        assertEquals(Apodization.NORTON_BEER_MEDIUM, method.transform().apodization());

        // an axis step that has no short decimal form must come back exactly
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 700.0 + 1.0 / 3, 15798.0 / 65536, 13275);
        LibraryPlan plan = LibraryPlan.read(write("library.plan", DemoMethod.libraryPlanText(axis, "line-lists")));
        assertEquals(axis.first(), plan.axis().first());
        assertEquals(axis.step(), plan.axis().step());
        assertEquals(DemoScenario.GASES.size(), plan.gases().size());
        assertEquals(DemoScenario.CELL_TEMPERATURE, plan.temperatureK());
        assertEquals(DemoScenario.RESOLUTION, plan.resolution());
        // the conditions travel with the plan and the references, not in the library's name
        assertTrue(plan.name().chars().noneMatch(Character::isDigit), plan.name());
        LibraryPlan.Gas co = plan.gases().stream().filter(g -> g.compound().name().equals("CO")).findFirst()
                .orElseThrow();
        // CO at 0.5, 1.5 and 8 times its nominal 12 ppm over 6.4 m
        // written as a person writes them, not as double arithmetic leaves them (38.400000000000006)
        assertEquals(List.of(38.4, 115.2, 614.4), co.ppmMetres());
        assertTrue(Files.readString(folder.resolve("library.plan")).contains("ppm-m = 38.4, 115.2, 614.4\n"));
        assertEquals(folder.resolve("line-lists/co-invented.par"), co.lineList());
        assertEquals("table", co.partition());
        assertEquals(folder.resolve("line-lists/co-q.txt"), co.partitionTable());

        QaPlan qa = QaPlan.read(write("qa.plan", DemoMethod.qaPlanText()));
        assertEquals(DemoCampaignFiles.CTS_CO_PPM, qa.ctsPpm());
        assertEquals("SF6", qa.tracer());
        assertEquals(Duration.ofHours(24), qa.backgroundAgeLimit());

        ReportPlan report = ReportPlan.read(write("report.plan", DemoMethod.reportPlanText("raw/o2.csv", "qa.plan")));
        assertEquals(List.of(Duration.ofMinutes(30), Duration.ofDays(1)), report.periods());
        assertEquals(6, report.reported().size());
        assertEquals("morning upset", report.exampleCaption());
        assertEquals(DemoScenario.CLIENT, report.campaign().client());
        assertTrue(report.campaign().reportingBasis().contains("11 % O2"), report.campaign().reportingBasis());
    }
}
