package org.tracegas.qa.checks;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.commons.math3.distribution.TDistribution;
import org.tracegas.qa.internal.Format;
import org.tracegas.qa.internal.Require;
import org.tracegas.qa.internal.Stats;

/**
 * Method detection limit and minimum analyte uncertainty of one analyte from replicate zero-gas readings that went
 * through the whole chain (transform, background ratio, fit, correction to the cell's temperature, pressure and
 * path) as samples do, so that the limit is on the basis of the results it is compared with.
 * <p>
 * MDL = t(n-1, 1-alpha = 0.99) · S, with S the sample standard deviation of the n replicate results and t the
 * one-sided 99 % Student's t value with n-1 degrees of freedom (40 CFR Part 136 Appendix B, procedure; its table
 * gives t(6) = 3.143 for 7 replicates). Appendix B asks for at least 7 replicates: fewer give an MDL that is stated
 * but fails its check. Revision 2 of Appendix B (2017; its definition, "distinguishable from method blank results",
 * and its initial estimate from the mean plus three standard deviations of method blanks were read in a retrieved
 * copy) also computes an MDL_b from method blanks, which zero-gas readings are, with the blanks' mean in it. Its
 * formula and its rule for a negative mean were not found in a retrieved text, so the mean is not added here.
 * <p>
 * The minimum analyte uncertainty (MAU) is the concentration uncertainty the spectral noise alone leaves (EPA Method
 * 320 §8.1.6, computed as its FTIR Protocol describes): here three times the root mean square of the fit's
 * noise-limited standard uncertainties of the same zero readings.
 *
 * @param analyte                   name of the analyte
 * @param readings                  n, the number of replicate zero-gas results
 * @param standardDeviation         S of the results, ppm
 * @param t                         t(n-1, 0.99)
 * @param minimumAnalyteUncertainty MAU, ppm
 */
public record MethodDetectionLimit(String analyte, int readings, double standardDeviation, double t,
        double minimumAnalyteUncertainty) {

    /** Replicates 40 CFR Part 136 Appendix B asks for at least. */
    public static final int MINIMUM_READINGS = 7;
    /** Check name of the MDL outcome, followed by the analyte. */
    public static final String MDL_CHECK = "Method detection limit ";
    /** Check name of the MAU outcome, followed by the analyte. */
    public static final String MAU_CHECK = "Minimum analyte uncertainty ";

    static final String MDL_SOURCE = "40 CFR Part 136 Appendix B, procedure (MDL = t(n-1, 1-alpha = 0.99) x S, "
            + "at least 7 replicates; t table as reproduced in Wis. Adm. Code NR 252.0365). Revision 2 (2017) "
            + "defines the MDL as distinguishable from method blank results and adds one from the blanks (MDL_b, "
            + "with their mean): not applied, its text was not retrieved (not confirmed)";
    static final String MAU_SOURCE = "EPA Method 320 section 8.1.6 and the EPA FTIR Protocol appendix A (MAU: the "
            + "noise-limited concentration uncertainty; not confirmed against the official text); stated as 3 x the "
            + "root mean square of the fit's noise-limited standard uncertainty: common practice, no source";
    /** The number of readings the MDL rule states, read back from a stored outcome. */
    private static final Pattern STATED = Pattern.compile("MDL = t\\(n-1, 0\\.99\\) x S = \\S+ x \\S+ ppm with "
            + "n = (\\d+) .*");

    public MethodDetectionLimit {
        Require.text("analyte", analyte);
        if (readings < 2) {
            throw new IllegalArgumentException("readings of " + analyte + " must be at least 2, was " + readings);
        }
        Require.nonNegative("standardDeviation", standardDeviation);
        Require.positive("t", t);
        Require.nonNegative("minimumAnalyteUncertainty", minimumAnalyteUncertainty);
    }

    /**
     * @param resultsPpm               the analyte's results of the replicate zero-gas readings, ppm
     * @param standardUncertaintiesPpm the fit's noise-limited standard uncertainty of each of those results, ppm
     */
    public static MethodDetectionLimit fromZeroReadings(String analyte, double[] resultsPpm,
            double[] standardUncertaintiesPpm) {
        Require.notNull("resultsPpm", resultsPpm);
        Require.notNull("standardUncertaintiesPpm", standardUncertaintiesPpm);
        if (resultsPpm.length != standardUncertaintiesPpm.length) {
            throw new IllegalArgumentException("standardUncertaintiesPpm of " + analyte + " has "
                    + standardUncertaintiesPpm.length + " values for " + resultsPpm.length + " results");
        }
        double sumSquares = 0;
        for (double u : standardUncertaintiesPpm) {
            Require.nonNegative("standardUncertaintiesPpm", u);
            sumSquares += u * u;
        }
        double s = Stats.sampleStandardDeviation(resultsPpm);
        return new MethodDetectionLimit(analyte, resultsPpm.length, s, oneSidedT99(resultsPpm.length - 1),
                3 * Math.sqrt(sumSquares / standardUncertaintiesPpm.length));
    }

    /** t(nu, 1-alpha = 0.99): the 99th percentile of Student's t distribution with nu degrees of freedom. */
    public static double oneSidedT99(int degreesOfFreedom) {
        if (degreesOfFreedom < 1) {
            throw new IllegalArgumentException("degreesOfFreedom must be at least 1, was " + degreesOfFreedom);
        }
        return new TDistribution(null, degreesOfFreedom).inverseCumulativeProbability(0.99);
    }

    /** MDL = t · S, ppm. */
    public double ppm() {
        return t * standardDeviation;
    }

    /** As a detection limit, to judge against the one a test plan requires. */
    public DetectionLimit detectionLimit() {
        return new DetectionLimit(analyte, ppm(), "t(n-1, 0.99) x S of " + readings + " zero-gas results");
    }

    /**
     * The two outcomes a workspace stores: the MDL, which fails when fewer than {@value #MINIMUM_READINGS} readings
     * made it, and the MAU, stated without limits.
     */
    public List<CheckOutcome> outcomes() {
        Rule mdlRule = new Rule(String.format(Locale.ROOT, "MDL = t(n-1, 0.99) x S = %.3f x %s ppm with n = %d "
                + "replicate zero-gas readings quantified and corrected to their cell as samples are (at least %d "
                + "needed)", t,
                Format.number(standardDeviation), readings, MINIMUM_READINGS), MDL_SOURCE);
        Rule mauRule = new Rule(String.format(Locale.ROOT, "MAU = 3 x RMS of the fit's noise-limited standard "
                + "uncertainty over the same %d zero-gas readings", readings), MAU_SOURCE);
        return List.of(
                new CheckOutcome(MDL_CHECK + analyte, readings >= MINIMUM_READINGS, ppm(), "ppm",
                        new AcceptanceLimits(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY), mdlRule),
                new CheckOutcome(MAU_CHECK + analyte, true, minimumAnalyteUncertainty, "ppm",
                        new AcceptanceLimits(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY), mauRule));
    }

    /**
     * The limits read back from stored outcomes made by {@link #outcomes()}, by analyte in name order; outcomes of
     * other checks are passed over.
     *
     * @throws IllegalArgumentException if an MDL outcome's rule does not state t, S and n, or an analyte lacks its
     *                                  MAU outcome
     */
    public static List<MethodDetectionLimit> fromOutcomes(List<CheckOutcome> outcomes) {
        Map<String, CheckOutcome> mdl = new TreeMap<>();
        Map<String, CheckOutcome> mau = new TreeMap<>();
        for (CheckOutcome o : Require.notNull("outcomes", outcomes)) {
            if (o.check().startsWith(MDL_CHECK)) {
                mdl.put(o.check().substring(MDL_CHECK.length()), o);
            } else if (o.check().startsWith(MAU_CHECK)) {
                mau.put(o.check().substring(MAU_CHECK.length()), o);
            }
        }
        List<MethodDetectionLimit> limits = new ArrayList<>(mdl.size());
        for (Map.Entry<String, CheckOutcome> e : mdl.entrySet()) {
            Matcher m = STATED.matcher(e.getValue().rule().statement());
            if (!m.matches()) {
                throw new IllegalArgumentException("the rule of check '" + e.getValue().check()
                        + "' does not state t, S and n: " + e.getValue().rule().statement());
            }
            CheckOutcome u = mau.get(e.getKey());
            if (u == null) {
                throw new IllegalArgumentException("check '" + e.getValue().check() + "' has no '" + MAU_CHECK
                        + e.getKey() + "' beside it");
            }
            // t follows from n exactly, and S from the stored MDL, so that the limit read back is the one stored
            int n = Integer.parseInt(m.group(1));
            double t = oneSidedT99(n - 1);
            limits.add(new MethodDetectionLimit(e.getKey(), n, e.getValue().measured() / t, t, u.measured()));
        }
        return List.copyOf(limits);
    }
}
