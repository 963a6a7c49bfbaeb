package org.tracegas.library.synthesis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Immutable list of spectral lines, sorted by wavenumber. */
public final class LineList {

    private final String name;
    private final List<SpectralLine> lines;

    /**
     * @param name  where the lines come from (a file name, or a description), not blank
     * @param lines the lines, at least one; they are sorted by wavenumber
     */
    public LineList(String name, List<SpectralLine> lines) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("line list name must not be blank");
        }
        if (lines == null || lines.isEmpty()) {
            throw new IllegalArgumentException("line list '" + name + "' holds no lines");
        }
        List<SpectralLine> sorted = new ArrayList<>(lines);
        sorted.sort(Comparator.comparingDouble(SpectralLine::wavenumber));
        this.name = name;
        this.lines = List.copyOf(sorted);
    }

    public String name() {
        return name;
    }

    public int size() {
        return lines.size();
    }

    public SpectralLine get(int index) {
        return lines.get(index);
    }

    /** The lines in order of rising wavenumber. */
    public List<SpectralLine> lines() {
        return lines;
    }

    @Override
    public String toString() {
        return "LineList[" + name + ", " + lines.size() + " lines, " + lines.get(0).wavenumber() + " .. "
                + lines.get(lines.size() - 1).wavenumber() + " cm-1]";
    }
}
