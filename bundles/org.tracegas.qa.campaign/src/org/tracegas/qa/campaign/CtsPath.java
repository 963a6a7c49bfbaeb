package org.tracegas.qa.campaign;

import java.io.IOException;
import java.util.List;

import org.tracegas.importer.ImportException;
import org.tracegas.pipeline.MeasurementQuantification;
import org.tracegas.pipeline.ResultCorrection;
import org.tracegas.method.StoredMethod;
import org.tracegas.pipeline.ContainerContents;
import org.tracegas.pipeline.MeasuredSpectrum;
import org.tracegas.pipeline.MeasurementRole;
import org.tracegas.pipeline.QaMeasurements;
import org.tracegas.qa.campaign.internal.CtsPathQaCheck;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.preprocess.Background;
import org.tracegas.store.WorkspaceStore;

/**
 * The sample cell's effective path from a campaign's CTS readings, for a method whose results are corrected to
 * it ({@code path-source = cts-derived}): each CTS reading of the QA file (or imported from the lab's files) goes
 * through the method's transform and the ratio against the backgrounds, its band gives
 * L_s = L_r (A_s/A_r)(C_r/C_s)(T_s/T_r)(p_r/p_s) against the CTS reference of the method's library (EPA Method
 * 320 section 10.2, as the CTS path check computes it), and the mean of the readings is the path, as Method 320
 * brackets a run with CTS readings before and after.
 */
public final class CtsPath {

    private CtsPath() {
    }

    /**
     * @param plan     the QA plan: CTS gas, its content and band, and the library
     * @param method   the method whose nominal path the CTS reference is scaled to
     * @param qa       the QA file's contents: its backgrounds and CTS readings (role in the header)
     * @param software the software version the CTS readings' fits name
     * @return the mean effective path in m
     * @throws FileFormatException if the plan's library is not the method's or lacks the CTS compound, or the
     *                             QA file holds no CTS reading
     */
    public static double measure(WorkspaceStore store, QaPlan plan, StoredMethod method, ContainerContents qa,
            String software) throws IOException {
        List<MeasuredSpectrum> cts = QaEvaluation.measured(plan, method, qa).stream()
                .filter(m -> m.role().equals(MeasurementRole.CTS)).toList();
        QaMeasurements fitted = QaMeasurements.fit(cts,
                method.quantifier(qa.backgrounds().get(0).singleBeam().axis(), software, false));
        return mean(store, plan, method, fitted, qa.backgrounds());
    }

    /**
     * The path from the CTS readings the project holds from the lab's files (those whose labels state the CTS role,
     * the files of the last plan not yet stored among them), made absorbance and fitted as quantify treats its
     * samples, with the project's backgrounds.
     *
     * @param imports the quantification of the project with the method, planned
     * @throws ImportException     naming the file, record and field of a QA measurement that cannot be fitted
     * @throws FileFormatException if the plan's library is not the method's or lacks the CTS compound, or the
     *                             project holds no CTS reading
     */
    public static double measure(WorkspaceStore store, QaPlan plan, StoredMethod method,
            MeasurementQuantification imports) throws IOException, ImportException {
        return mean(store, plan, method, imports.qaMeasurements(), imports.backgrounds());
    }

    /**
     * The path from the CTS readings among a campaign's fitted QA measurements, as
     * {@link #measure(WorkspaceStore, QaPlan, StoredMethod, ContainerContents, String)} derives it.
     *
     * @param backgrounds the campaign's backgrounds; none for spectra imported as absorbance
     * @throws FileFormatException if the plan's library is not the method's or lacks the CTS compound, or there
     *                             is no CTS reading
     */
    static double mean(WorkspaceStore store, QaPlan plan, StoredMethod method, QaMeasurements fitted,
            List<Background> backgrounds) throws IOException {
        List<QaMeasurements.Fitted> cts = fitted.withRole(MeasurementRole.CTS);
        if (cts.isEmpty()) {
            throw new FileFormatException(plan.file(), 0, "cts-compound", "the QA readings hold no CTS reading (role "
                    + MeasurementRole.CTS + ") to derive the path of method " + method.method().name() + " from");
        }
        // the CTS readings' own span stands for the samples': no check reading the span runs here; the band
        // areas are of the absorbance, which no correction of amounts touches
        PlanInputs inputs = new PlanInputs(plan, fitted, backgrounds, cts.get(0).time(),
                cts.get(cts.size() - 1).time(), method.method().pathLengthMetres(),
                QaEvaluation.methodLibrary(store, plan, method), ResultCorrection.none());
        return CtsPathQaCheck.effectivePaths(inputs).stream().mapToDouble(Double::doubleValue).average()
                .orElseThrow();
    }
}
