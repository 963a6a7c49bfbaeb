package org.tracegas.report.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Project;
import org.tracegas.model.Site;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.report.Campaign;

/**
 * The plant and source a report names, from the project's emission source in the workspace, checked against a plan
 * that names them too; an invented brick works.
 */
class CampaignPlaceTest {

    /** The plan's own plant and source lines, which each test replaces. */
    private static final String PLACE = "plant = Kiln 5\nsource = Kiln 5 stack\n";

    @TempDir
    Path folder;

    private ReportPlan plan(String placeLines) throws Exception {
        assertTrue(ReportPlanTest.PLAN.contains(PLACE));
        return ReportPlan.read(Files.writeString(folder.resolve("lab-report.plan"), ReportPlanTest.PLAN.replace(PLACE,
                placeLines.isEmpty() ? "" : placeLines + "\n"), StandardCharsets.UTF_8));
    }

    /** A project of the brick works, at kiln 5's stack in the workspace when {@code placed}. */
    private static Project project(boolean placed) {
        WorkspaceFactory f = WorkspaceFactory.eINSTANCE;
        Client client = f.createClient();
        client.setName("Lakeside Brick Works");
        Project p = f.createProject();
        p.setCode("LBW-05");
        client.getProjects().add(p);
        if (placed) {
            Site works = f.createSite();
            works.setName("Lakeside works");
            EmissionSource stack = f.createEmissionSource();
            stack.setName("Kiln 5 stack");
            works.getSources().add(stack);
            client.getSites().add(works);
            p.setSource(stack);
        }
        return p;
    }

    @Test
    void theWorkspaceNamesPlantAndSourceWhereThePlanLeavesThem() throws Exception {
        ReportPlan plan = plan("");
        assertFalse(plan.campaign().placed());
        Campaign c = CampaignPlace.of(plan, project(true));
        assertEquals("Lakeside works", c.plant());
        assertEquals("Kiln 5 stack", c.source());
        assertEquals("R-2026-044", c.reportId());
    }

    @Test
    void aPlanThatNamesThemMustAgreeWithTheWorkspace() throws Exception {
        assertEquals("Lakeside works", CampaignPlace.of(plan("plant = Lakeside works\nsource = Kiln 5 stack"),
                project(true)).plant());
        FileFormatException e = assertThrows(FileFormatException.class,
                () -> CampaignPlace.of(plan("plant = Lakeside works\nsource = Kiln 4 stack"), project(true)));
        assertTrue(e.getMessage().contains("lab-report.plan") && e.getMessage().contains("source")
                && e.getMessage().contains("'Kiln 4 stack'") && e.getMessage().contains("'Kiln 5 stack'"),
                e.getMessage());
    }

    @Test
    void aProjectWithoutSourceTakesThemFromItsPlanAndNeedsThem() throws Exception {
        Campaign c = CampaignPlace.of(plan("plant = Kiln 5\nsource = Kiln 5 stack"), project(false));
        assertEquals("Kiln 5", c.plant());
        FileFormatException e = assertThrows(FileFormatException.class, () -> CampaignPlace.of(plan(""),
                project(false)));
        assertTrue(e.getMessage().contains("LBW-05") && e.getMessage().contains("plant"), e.getMessage());
        FileFormatException half = assertThrows(FileFormatException.class, () -> plan("plant = Kiln 5"));
        assertTrue(half.getMessage().contains("source"), half.getMessage());
    }
}
