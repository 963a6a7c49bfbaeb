package org.tracegas.importer.jcamp.internal;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** One JCAMP-DX block from ##TITLE to ##END, with the nested blocks of a linked (compound) block. */
public final class Block {

    private final List<Ldr> records = new ArrayList<>();
    private final List<Block> children = new ArrayList<>();
    private int endLine;

    void add(Ldr ldr) {
        records.add(ldr);
    }

    void addChild(Block child) {
        children.add(child);
    }

    void end(int line) {
        endLine = line;
    }

    public List<Ldr> records() {
        return Collections.unmodifiableList(records);
    }

    public List<Block> children() {
        return Collections.unmodifiableList(children);
    }

    public int startLine() {
        return records.get(0).line();
    }

    public int endLine() {
        return endLine;
    }

    /** The first record with this normalised label, or null. */
    public Ldr find(String label) {
        for (Ldr r : records) {
            if (r.label().equals(label)) {
                return r;
            }
        }
        return null;
    }

    public boolean isLinkBlock() {
        return find("BLOCKS") != null;
    }
}
