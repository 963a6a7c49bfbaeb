package org.tracegas.ui.session;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.tracegas.model.AccessLevel;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.Project;
import org.tracegas.model.Provenance;
import org.tracegas.model.Result;
import org.tracegas.model.ResultFlag;
import org.tracegas.model.Results;
import org.tracegas.model.Role;
import org.tracegas.model.VersionKind;
import org.tracegas.model.WorkBatch;
import org.tracegas.model.WorkBatches;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * A workspace that already holds data, written through the store API: an administrator, an analyst and a
 * reviewer; a stack campaign of the analyst with a background and {@link #SAMPLES} one-minute samples, CO and
 * NO results for the first three samples (the third NO value flagged), and a project of another client the
 * analyst has no grant on.
 */
final class ExistingWorkspace {

    static final String ANALYST = "l.brandt";
    static final String REVIEWER = "k.osei";
    static final String PASSWORD = "existing-workspace-pass";
    static final String CODE = "RIV-2026-05";
    static final String HIDDEN_CODE = "ZZ-2026-01";
    static final int SAMPLES = 230;
    static final Instant BACKGROUND = Instant.parse("2026-05-04T05:55:00Z");
    static final Instant FIRST_SAMPLE = Instant.parse("2026-05-04T06:00:00Z");
    /** CO and NO of the first three samples, ppm. */
    static final double[][] PPM = {{41.5, 12.0}, {44.25, 12.5}, {39.75, 13.25}};

    final Project project;
    final List<String> sampleIds;
    /** The container files of the day, shared out to the runners (not worked in these tests). */
    final WorkBatch batch;

    ExistingWorkspace(WorkspaceStore store) {
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", PASSWORD.toCharArray());
        String analystId = store.users().createUser(admin, ANALYST, "Lena Brandt", Set.of(Role.ANALYST),
                PASSWORD.toCharArray()).getId();
        store.users().createUser(admin, REVIEWER, "Kofi Osei", EnumSet.of(Role.REVIEWER), PASSWORD.toCharArray());
        String river = store.projects().createClient(admin, "Riverside Incinerator").getId();
        project = store.projects().createProject(admin, river, CODE, "Line 2 stack, May campaign");
        store.projects().grant(admin, project.getId(), analystId, AccessLevel.WRITE);
        String other = store.projects().createClient(admin, "Northern Paper Mill").getId();
        store.projects().createProject(admin, other, HIDDEN_CODE, "Boiler flue");

        Session analyst = store.users().logIn(ANALYST, PASSWORD.toCharArray());
        store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.BACKGROUND, BACKGROUND, 453.15,
                1013.0);
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < SAMPLES; i++) {
            ids.add(store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.SAMPLE,
                    FIRST_SAMPLE.plus(Duration.ofMinutes(i)), 453.15, 1013.0));
        }
        sampleIds = List.copyOf(ids);
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "Stack CO and NO",
                "compounds=CO,NO\n", "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Stack references",
                "CO=1\nNO=1\n", "first");
        List<Result> results = new ArrayList<>();
        // stored newest first, so the traces must sort by measurement time themselves
        for (int i = PPM.length - 1; i >= 0; i--) {
            results.add(result(ids.get(i), "CO", PPM[i][0], Set.of(), method, library));
            results.add(result(ids.get(i), "NO", PPM[i][1], i == 2 ? Set.of(ResultFlag.HIGH_RESIDUAL) : Set.of(),
                    method, library));
        }
        store.results().recordAll(analyst, project.getId(), results);
        batch = store.workUnits().createBatch(analyst, project.getId(), WorkBatches.of(method.getId(),
                "container files of 4 May"), List.of("/data/riv/0504-a.tgc", "/data/riv/0504-b.tgc",
                        "/data/riv/0504-c.tgc"));
    }

    private static Result result(String measurementId, String compound, double ppm, Set<ResultFlag> flags,
            ContentVersion method, ContentVersion library) {
        return Results.of(measurementId, compound, ppm, 0.5, 0.2, "ppm", flags,
                new Provenance(method.getId(), library.getId(), "Tracegas Workbench 0.1.0", "0".repeat(64)), null);
    }
}
