package org.tracegas.ui.views;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
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
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * A day of one-minute flue gas measurements written through the store API: {@link #MINUTES} samples of a
 * cement kiln stack with results for three trace gases and the two major components of flue gas (water vapour
 * and carbon dioxide at about ten percent), every {@link #FLAG_EVERY}th NO value flagged; and a second, small
 * project of the same analyst with CO results only.
 */
final class CampaignDay {

    static final String ANALYST = "r.haddad";
    static final String PASSWORD = "campaign-day-pass";
    static final String CODE = "KLN-2026-07";
    static final String SMALL_CODE = "KLN-2026-08";
    static final int MINUTES = 1440;
    static final int FLAG_EVERY = 97;
    static final Instant START = Instant.parse("2026-07-14T00:00:00Z");
    static final List<String> TRACE = List.of("CO", "NO", "N2O");
    static final List<String> MAJOR = List.of("H2O", "CO2");

    final Project project;
    final Project small;

    CampaignDay(WorkspaceStore store) {
        Session admin = store.users().createFirstAdministrator("admin", "Administrator", PASSWORD.toCharArray());
        String analystId = store.users().createUser(admin, ANALYST, "Rana Haddad",
                Set.of(Role.ANALYST), PASSWORD.toCharArray()).getId();
        String client = store.projects().createClient(admin, "Eastfield Cement").getId();
        project = store.projects().createProject(admin, client, CODE, "Kiln 1 stack, July day");
        small = store.projects().createProject(admin, client, SMALL_CODE, "Kiln 2 stack, spot check");
        store.projects().grant(admin, project.getId(), analystId, AccessLevel.WRITE);
        store.projects().grant(admin, small.getId(), analystId, AccessLevel.WRITE);

        Session analyst = store.users().logIn(ANALYST, PASSWORD.toCharArray());
        ContentVersion method = store.versions().create(analyst, VersionKind.METHOD, "Kiln stack five gases",
                "compounds=CO,NO,N2O,H2O,CO2\n", "first");
        ContentVersion library = store.versions().create(analyst, VersionKind.LIBRARY, "Kiln references",
                "CO=1\nNO=1\nN2O=1\nH2O=1\nCO2=1\n", "first");
        List<Result> results = new ArrayList<>();
        for (int i = 0; i < MINUTES; i++) {
            String m = store.projects().recordMeasurement(analyst, project.getId(), MeasurementKind.SAMPLE,
                    START.plus(Duration.ofMinutes(i)), 453.15, 1013.0);
            double phase = 2 * Math.PI * i / MINUTES;
            // invented but plausible levels for a kiln stack (common practice, no source): CO tens of ppm,
            // NO around a hundred, N2O a few ppm; water vapour and CO2 around ten percent (1e5 ppm)
            results.add(result(m, "CO", 40 + 10 * Math.sin(phase), Set.of(), method, library));
            results.add(result(m, "NO", 120 + 25 * Math.cos(phase),
                    i % FLAG_EVERY == 0 ? Set.of(ResultFlag.HIGH_RESIDUAL) : Set.of(), method, library));
            results.add(result(m, "N2O", 3 + 0.5 * Math.sin(3 * phase), Set.of(), method, library));
            results.add(result(m, "H2O", 95_000 + 8_000 * Math.sin(phase), Set.of(), method, library));
            results.add(result(m, "CO2", 180_000 + 12_000 * Math.cos(2 * phase), Set.of(), method, library));
        }
        store.results().recordAll(analyst, project.getId(), results);
        String spot = store.projects().recordMeasurement(analyst, small.getId(), MeasurementKind.SAMPLE,
                START.plus(Duration.ofHours(30)), 453.15, 1013.0);
        store.results().recordAll(analyst, small.getId(), List.of(result(spot, "CO", 55, Set.of(), method, library)));
    }

    private static Result result(String measurementId, String compound, double ppm, Set<ResultFlag> flags,
            ContentVersion method, ContentVersion library) {
        return Results.of(measurementId, compound, ppm, 0.5, 0.2, "ppm", flags,
                new Provenance(method.getId(), library.getId(), "Tracegas Workbench 0.1.0", "0".repeat(64)), null);
    }
}
