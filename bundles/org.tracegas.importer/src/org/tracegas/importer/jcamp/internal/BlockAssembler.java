package org.tracegas.importer.jcamp.internal;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

import org.tracegas.importer.ImportException;

/** Groups labelled data records into blocks, nesting the blocks of a linked block (##BLOCKS=n). */
public final class BlockAssembler {

    private BlockAssembler() {
    }

    public static List<Block> assemble(List<Ldr> ldrs, String source) throws ImportException {
        List<Block> top = new ArrayList<>();
        Deque<Block> open = new ArrayDeque<>();
        int lastLine = 0;
        for (Ldr ldr : ldrs) {
            lastLine = ldr.lastLine();
            if (ldr.label().isEmpty()) {
                continue; // "##=" is a comment record
            }
            if (ldr.label().equals("TITLE")) {
                if (!open.isEmpty() && !open.peek().isLinkBlock()) {
                    throw new ImportException(source, ldr.line(), "##TITLE", "a new block starts before the"
                            + " block of line " + open.peek().startLine() + " ended with ##END=");
                }
                open.push(new Block());
            } else if (open.isEmpty()) {
                throw new ImportException(source, ldr.line(), "##" + ldr.rawLabel(),
                        "record outside a block; every block starts with ##TITLE=");
            }
            Block current = open.peek();
            current.add(ldr);
            if (ldr.label().equals("END")) {
                current.end(ldr.line());
                open.pop();
                if (open.isEmpty()) {
                    top.add(current);
                } else {
                    open.peek().addChild(current);
                }
            }
        }
        if (!open.isEmpty()) {
            throw new ImportException(source, lastLine, "##END", "file ends inside the block starting at line "
                    + open.peek().startLine() + " (truncated file?)");
        }
        if (top.isEmpty()) {
            throw new ImportException(source, 1, "##TITLE", "no JCAMP-DX block found");
        }
        return top;
    }
}
