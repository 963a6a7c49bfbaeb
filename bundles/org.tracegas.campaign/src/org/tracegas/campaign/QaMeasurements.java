package org.tracegas.campaign;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tracegas.quantify.CompoundResult;
import org.tracegas.quantify.Quantifier;
import org.tracegas.quantify.Sample;
import org.tracegas.quantify.SpectrumResult;

/** The QA measurements of a campaign (CTS, zero, spiked and unspiked pairs), each with its fit. */
public final class QaMeasurements {

    /** A QA measurement and what the method found in it. */
    public record Fitted(MeasuredSpectrum measured, SpectrumResult result) {

        public double ppm(String compound) {
            return result.compound(compound).map(CompoundResult::concentration)
                    .orElseThrow(() -> new IllegalArgumentException("the method does not report " + compound));
        }
    }

    private final List<Fitted> all;

    private QaMeasurements(List<Fitted> all) {
        this.all = List.copyOf(all);
    }

    public static QaMeasurements fit(List<MeasuredSpectrum> measured, Quantifier quantifier) {
        List<Fitted> fitted = new ArrayList<>();
        for (MeasuredSpectrum m : measured) {
            // the uncertainty widened by the transform's noise factor as a sample's is, so that zero readings
            // judge, and give detection limits for, the uncertainty the samples carry
            fitted.add(new Fitted(m, quantifier.quantify(new Sample(m.ratio().spectrum(), null,
                    ResultCorrection.noiseCorrelation(m.noiseFactor())))));
        }
        return new QaMeasurements(fitted);
    }

    /** The measurements of one role, in time order. */
    public List<Fitted> withRole(String role) {
        return all.stream().filter(f -> f.measured().role().equals(role))
                .sorted((a, b) -> a.measured().time().compareTo(b.measured().time())).toList();
    }

    /** Pairs each spiked measurement with the unspiked one taken just before it. */
    public List<Map.Entry<Fitted, Fitted>> spikePairs(String spikeRole, String unspikedRole) {
        List<Fitted> spikes = withRole(spikeRole);
        List<Fitted> natives = withRole(unspikedRole);
        List<Map.Entry<Fitted, Fitted>> pairs = new ArrayList<>();
        for (Fitted spike : spikes) {
            Fitted before = null;
            for (Fitted n : natives) {
                if (n.measured().time().isBefore(spike.measured().time())) {
                    before = n;
                }
            }
            if (before == null) {
                throw new IllegalArgumentException("spiked measurement at " + spike.measured().time()
                        + " has no unspiked measurement before it");
            }
            pairs.add(Map.entry(spike, before));
        }
        return pairs;
    }
}
