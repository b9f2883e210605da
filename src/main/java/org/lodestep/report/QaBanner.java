package org.lodestep.report;

import java.util.List;
import java.util.Map;

import org.lodestep.qa.Verdict;

/** The verdict in block letters, so an inspector reads it from across the bench. */
final class QaBanner {
    private static final Map<Character, String[]> GLYPHS = Map.ofEntries(
            Map.entry('P', new String[] {"#### ", "#   #", "#### ", "#    ", "#    "}),
            Map.entry('A', new String[] {" ### ", "#   #", "#####", "#   #", "#   #"}),
            Map.entry('S', new String[] {" ####", "#    ", " ### ", "    #", "#### "}),
            Map.entry('F', new String[] {"#####", "#    ", "#### ", "#    ", "#    "}),
            Map.entry('I', new String[] {"###", " # ", " # ", " # ", "###"}),
            Map.entry('L', new String[] {"#    ", "#    ", "#    ", "#    ", "#####"}),
            Map.entry('N', new String[] {"#   #", "##  #", "# # #", "#  ##", "#   #"}),
            Map.entry('C', new String[] {" ####", "#    ", "#    ", "#    ", " ####"}),
            Map.entry('O', new String[] {" ### ", "#   #", "#   #", "#   #", " ### "}),
            Map.entry('M', new String[] {"#   #", "## ##", "# # #", "#   #", "#   #"}),
            Map.entry('E', new String[] {"#####", "#    ", "#### ", "#    ", "#####"}),
            Map.entry('T', new String[] {"#####", "  #  ", "  #  ", "  #  ", "  #  "}));

    private QaBanner() {
    }

    /** Five lines of block letters for the verdict, framed, with a one-line caption under it. */
    static List<String> lines(Verdict v, String caption) {
        String word = v.name();
        StringBuilder[] rows = new StringBuilder[5];
        for (int r = 0; r < 5; r++) {
            rows[r] = new StringBuilder();
            for (char c : word.toCharArray()) {
                rows[r].append(GLYPHS.get(c)[r]).append("  ");
            }
        }
        int width = Math.max(rows[0].length(), caption.length()) + 4;
        char frame = v == Verdict.PASS ? '=' : v == Verdict.FAIL ? 'X' : '?';
        String bar = String.valueOf(frame).repeat(width + 3);
        List<String> out = new java.util.ArrayList<>();
        out.add(bar);
        for (StringBuilder row : rows) {
            out.add(frame + "   " + pad(row.toString(), width - 2) + frame);
        }
        out.add(frame + "   " + pad(caption, width - 2) + frame);
        out.add(bar);
        return out;
    }

    private static String pad(String s, int w) {
        return s.length() >= w ? s : s + " ".repeat(w - s.length());
    }
}
