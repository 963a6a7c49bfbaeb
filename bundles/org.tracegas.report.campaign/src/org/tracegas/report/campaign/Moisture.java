package org.tracegas.report.campaign;

import java.util.Locale;

/**
 * The moisture a campaign's results are made dry with: the method's own water result minute by minute, or, where
 * the method measures no water, one volume fraction stated in the report plan with its standard uncertainty and
 * where it was stated, which the report prints so that a reader sees that the dry basis rests on a stated value.
 *
 * @param compound                 the water result's compound, or null where the moisture is stated
 * @param statedPercent            the stated moisture, % vol; NaN where measured
 * @param statedUncertaintyPercent its standard uncertainty, % vol; NaN where measured
 * @param origin                   where the stated value comes from (plan file and line); null where measured
 */
public record Moisture(String compound, double statedPercent, double statedUncertaintyPercent, String origin) {

    public Moisture {
        if (compound == null) {
            if (!(statedPercent >= 0 && statedPercent < 100)) {
                throw new IllegalArgumentException("statedPercent must lie in [0, 100) % vol, was " + statedPercent);
            }
            if (!(statedUncertaintyPercent >= 0 && Double.isFinite(statedUncertaintyPercent))) {
                throw new IllegalArgumentException("statedUncertaintyPercent must be non-negative and finite, was "
                        + statedUncertaintyPercent);
            }
            if (origin == null || origin.isBlank()) {
                throw new IllegalArgumentException("origin: a stated moisture must say where it was stated");
            }
        } else if (compound.isBlank()) {
            throw new IllegalArgumentException("compound must not be blank");
        }
    }

    /** The method's water result, compound {@code compound}. */
    public static Moisture measured(String compound) {
        return new Moisture(compound, Double.NaN, Double.NaN, null);
    }

    /** A moisture stated where the method measures no water, % vol with its standard uncertainty. */
    public static Moisture stated(double percent, double uncertaintyPercent, String origin) {
        return new Moisture(null, percent, uncertaintyPercent, origin);
    }

    public boolean isStated() {
        return compound == null;
    }

    /** The report's sentence on a stated moisture: its value, uncertainty and origin, and what follows. */
    public String statement() {
        if (!isStated()) {
            throw new IllegalStateException("the moisture is measured as " + compound + ", not stated");
        }
        return String.format(Locale.ROOT, "Moisture of the dry basis: %s %% vol (standard uncertainty %s %% vol), "
                + "stated in %s, not measured: the method measures no water, so every minute is made dry with this "
                + "one value and its uncertainty enters the budget as a systematic part.", plain(statedPercent),
                plain(statedUncertaintyPercent), origin);
    }

    private static String plain(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
