package org.tracegas.qa.campaign;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.tracegas.qa.campaign.internal.BackgroundAgeQaCheck;
import org.tracegas.qa.campaign.internal.CtsDriftQaCheck;
import org.tracegas.qa.campaign.internal.CtsPathQaCheck;
import org.tracegas.qa.campaign.internal.MethodDetectionLimitQaCheck;
import org.tracegas.qa.campaign.internal.SpikeRecoveryQaCheck;
import org.tracegas.qa.campaign.internal.ZeroGasQaCheck;
import org.tracegas.qa.checks.CheckOutcome;
import org.tracegas.qa.checks.QaCheck;
import org.tracegas.qa.checks.QaCheckRegistry;
import org.tracegas.qa.checks.QaInputs;

/**
 * The QA checks of a campaign from its QA measurements, as its QA plan names them: the built-in ones (path
 * length from the calibration transfer standard before and after, its drift, spike recovery with a tracer, zero
 * gas with its noise, the method detection limit and minimum analyte uncertainty from the replicate zero-gas
 * readings, background age) and those other bundles contribute to {@link QaCheckRegistry#EXTENSION_POINT}.
 */
public final class CampaignQaChecks {

    /** The built-in checks by name, in the order a plan without a "checks" key evaluates them. */
    public static final List<String> BUILT_IN = List.of("cts-path", "cts-drift", "spike-recovery", "zero-gas",
            "method-detection-limit", "background-age");

    private CampaignQaChecks() {
    }

    /** The built-in checks, for use without an extension registry. */
    public static QaCheckRegistry builtIn() {
        return new QaCheckRegistry().register(new CtsPathQaCheck()).register(new CtsDriftQaCheck())
                .register(new SpikeRecoveryQaCheck()).register(new ZeroGasQaCheck())
                .register(new MethodDetectionLimitQaCheck()).register(new BackgroundAgeQaCheck());
    }

    /** The checks contributed to the running platform, or the built-in ones when no extension registry runs. */
    public static QaCheckRegistry available() {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        return running == null ? builtIn() : QaCheckRegistry.fromExtensions(running);
    }

    /** Every outcome of the checks, check by check in the given order. */
    public static List<CheckOutcome> evaluate(List<QaCheck> checks, QaInputs inputs) throws IOException {
        List<CheckOutcome> outcomes = new ArrayList<>();
        for (QaCheck check : checks) {
            outcomes.addAll(check.evaluate(inputs));
        }
        return outcomes;
    }
}
