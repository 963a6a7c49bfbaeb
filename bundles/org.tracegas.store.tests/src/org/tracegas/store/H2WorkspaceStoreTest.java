package org.tracegas.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracegas.model.Role;
import org.tracegas.model.SpectralContent;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/** The store contract on an embedded H2 database file in a temporary folder. */
class H2WorkspaceStoreTest extends WorkspaceStoreContract {

    @TempDir
    Path folder;

    @Override
    TestBackend newBackend() {
        return new H2Backend(folder);
    }

    /**
     * H2 hands out spectrum sequence numbers from a reserve it notes in the file; a database stopped without
     * closing, as by a power failure, keeps every committed spectrum and numbers the next ones after all
     * earlier ones. H2's SHUTDOWN IMMEDIATELY stops the database without writing its clean state, meant for
     * testing what a power failure leaves (H2 documentation, Commands: SHUTDOWN; from memory).
     */
    @Test
    void spectrumNumbersKeepIncreasingAfterTheDatabaseStopsWithoutClosing(@TempDir Path other) throws Exception {
        H2Backend backend = new H2Backend(other);
        WorkspaceStore store = backend.open();
        Session admin = store.users().createFirstAdministrator("admin", "Admin", "admin-password-1".toCharArray());
        store.users().createUser(admin, "ana", "Ana Lyst", Set.of(Role.ANALYST), "analyst-password-1".toCharArray());
        Session analyst = store.users().logIn("ana", "analyst-password-1".toCharArray());
        String project = store.projects().createProject(analyst,
                store.projects().createClient(analyst, "Cement works").getId(), "CW-2026-02", "Kiln stack").getId();
        Spectrum s = new Spectrum(SpectralAxis.uniform(AxisUnit.WAVENUMBER, 3000.0, -0.5, 4),
                new double[] {0.01, 0.02, 0.03, 0.04}, Ordinate.ABSORBANCE);
        String before = store.spectra().store(analyst, project, SpectrumInput.of(SpectralContent.ABSORBANCE, s));
        try (Connection c = backend.raw(); Statement st = c.createStatement()) {
            st.execute("SHUTDOWN IMMEDIATELY");
        }
        store = backend.open();
        try {
            String after = store.spectra().store(analyst, project, SpectrumInput.of(SpectralContent.ABSORBANCE, s));
            assertEquals(s.axis(), store.spectra().load(analyst, before).getSpectrum().axis());
            assertTrue(seq(backend, after) > seq(backend, before), "the later spectrum's number is larger");
        } finally {
            store.close();
        }
    }

    private static long seq(H2Backend backend, String spectrumId) throws SQLException {
        try (Connection c = backend.raw();
                PreparedStatement ps = c.prepareStatement("SELECT seq FROM spectral_data WHERE id = ?")) {
            ps.setString(1, spectrumId);
            try (ResultSet rs = ps.executeQuery()) {
                assertTrue(rs.next(), "spectrum " + spectrumId + " is stored");
                return rs.getLong(1);
            }
        }
    }
}
