package org.tracegas.quantify;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A compound to report, the interferents fitted together with it and the regions of its fit.
 *
 * @param compound    compound name of the analyte
 * @param interferents compound names fitted alongside (their concentrations are fitted, not reported here)
 * @param regions     analysis regions, at least one, not overlapping each other
 */
public record Analyte(String compound, List<String> interferents, List<AnalysisRegion> regions) {

    /** @throws IllegalArgumentException naming the field that is wrong */
    public Analyte {
        CompoundNames.require(compound, "compound");
        if (interferents == null) {
            throw new IllegalArgumentException("interferents of " + compound + " must not be null (may be empty)");
        }
        interferents = List.copyOf(interferents);
        Set<String> seen = new HashSet<>();
        seen.add(compound);
        for (String i : interferents) {
            CompoundNames.require(i, "interferent of " + compound);
            if (!seen.add(i)) {
                throw new IllegalArgumentException("interferent " + i + " of " + compound
                        + " is listed twice or is the analyte itself");
            }
        }
        if (regions == null || regions.isEmpty()) {
            throw new IllegalArgumentException("regions of " + compound + " must hold at least one region");
        }
        regions = List.copyOf(regions);
        for (int i = 0; i < regions.size(); i++) {
            for (int j = i + 1; j < regions.size(); j++) {
                if (regions.get(i).overlaps(regions.get(j))) {
                    throw new IllegalArgumentException("regions " + i + " and " + j + " of " + compound + " overlap");
                }
            }
        }
    }

    /** The analyte followed by its interferents: the compound columns of its fit. */
    public List<String> fittedCompounds() {
        ArrayList<String> all = new ArrayList<>(interferents.size() + 1);
        all.add(compound);
        all.addAll(interferents);
        return List.copyOf(all);
    }
}
