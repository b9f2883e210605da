package org.lodestep.report.html;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Draws a {@link WiringDiagram} as SVG: coils as loop symbols with a start dot, lead labels in rounded tags (with a
 * colour swatch where the label names a wire colour), and wires routed in lanes to the driver's terminals. Phase A
 * wires are solid, phase B dashed, the common dash-dotted; tied leads share a bar, insulated leads end in a cap.
 */
final class WiringDiagramSvg {
    private static final int WIDTH = 720;
    private static final int COIL_X = 180;
    private static final int PILL_X = 228;
    private static final int PILL_W = 112;
    private static final int PILL_RIGHT = PILL_X + PILL_W;
    private static final int TIE_X = 356;
    private static final int LANE_X = 430;
    private static final int LANE_STEP = 28;
    private static final int TERM_X = 592;
    private static final int TERM_W = 72;

    private static final String INK = "#1d2733";
    private static final String MUTED = "#5b6673";
    private static final String PHASE_A = "#2b5d8a";
    private static final String PHASE_B = "#b5562b";

    /** Wire colour words (and common abbreviations) and the swatch drawn for them. */
    private static final Map<String, String> SWATCH = new LinkedHashMap<>();

    static {
        String[][] pairs = {
            {"black", "#1b1b1b"}, {"blk", "#1b1b1b"}, {"red", "#c8322b"}, {"green", "#2e8b3a"}, {"grn", "#2e8b3a"},
            {"blue", "#2b5fb8"}, {"blu", "#2b5fb8"}, {"yellow", "#e8c619"}, {"yel", "#e8c619"}, {"white", "#ffffff"},
            {"wht", "#ffffff"}, {"brown", "#7a4a24"}, {"brn", "#7a4a24"}, {"orange", "#ec7a1c"}, {"org", "#ec7a1c"},
            {"grey", "#8c8c8c"}, {"gray", "#8c8c8c"}, {"gry", "#8c8c8c"}, {"violet", "#7b3fa0"},
            {"purple", "#7b3fa0"}, {"pink", "#e889b5"}
        };
        for (String[] p : pairs) {
            SWATCH.put(p[0], p[1]);
        }
    }

    private WiringDiagramSvg() {
    }

    /** Where a lead tag was drawn. */
    private record Tag(String lead, int y) {
    }

    static SvgFragment render(WiringDiagram d) {
        StringBuilder body = new StringBuilder();
        List<Tag> tags = new ArrayList<>();
        Map<String, int[]> phaseSpan = new LinkedHashMap<>();
        int y = 56;
        String lastPhase = null;
        int coilsInPhase = 0;
        for (WiringDiagram.Coil c : d.coils()) {
            if (lastPhase != null) {
                y += c.phase().equals(lastPhase) ? 14 : 40;
            }
            coilsInPhase = c.phase().equals(lastPhase) ? coilsInPhase + 1 : 1;
            lastPhase = c.phase();
            int h = c.tapLead() == null ? 104 : 140;
            int top = y + 10;
            int bot = y + h - 10;
            long samePhase = d.coils().stream().filter(k -> k.phase().equals(c.phase())).count();
            String name = samePhase > 1 ? c.phase() + coilsInPhase : c.phase();
            drawCoil(body, c, name, top, bot, d.startsKnown());
            tags.add(new Tag(c.startLead(), top));
            if (c.tapLead() != null) {
                tags.add(new Tag(c.tapLead(), (top + bot) / 2));
            }
            tags.add(new Tag(c.endLead(), bot));
            drawValues(body, d.valuesOf(c), top, bot);
            phaseSpan.merge(c.phase(), new int[] {top, bot}, (a, b) -> new int[] {Math.min(a[0], b[0]),
                Math.max(a[1], b[1])});
            y += h;
        }
        for (WiringDiagram.BrokenCoil c : d.brokenCoils()) {
            y += lastPhase != null ? 40 : 0;
            lastPhase = "";
            int top = y + 10;
            int bot = y + 94;
            drawBrokenCoil(body, c, top, bot);
            tags.add(new Tag(c.startLead(), top));
            if (c.endLead() != null) {
                tags.add(new Tag(c.endLead(), bot));
            }
            y += 104;
        }
        for (Map.Entry<String, int[]> e : phaseSpan.entrySet()) {
            drawPhaseLabel(body, e.getKey(), e.getValue()[0], e.getValue()[1]);
        }

        Map<DriverTerminal, Integer> termY = terminalRows(d, phaseSpan, tags);
        StringBuilder wires = new StringBuilder();
        StringBuilder caps = new StringBuilder();
        Map<DriverTerminal, List<Integer>> laneRows = new EnumMap<>(DriverTerminal.class);
        Map<Integer, List<Integer>> tieRows = new LinkedHashMap<>();
        for (Tag t : tags) {
            WiringDiagram.Destination dest = d.destination(t.lead());
            if (dest instanceof WiringDiagram.ToTerminal tt) {
                laneRows.computeIfAbsent(tt.terminal(), k -> new ArrayList<>()).add(t.y());
            } else if (dest instanceof WiringDiagram.ToTie tie) {
                tieRows.computeIfAbsent(tie.index(), k -> new ArrayList<>()).add(t.y());
            } else if (dest instanceof WiringDiagram.Insulated) {
                caps.append(line(PILL_RIGHT, t.y(), PILL_RIGHT + 12, t.y(), MUTED, 2, null))
                        .append("<rect x=\"").append(PILL_RIGHT + 12).append("\" y=\"").append(t.y() - 7)
                        .append("\" width=\"5\" height=\"14\" fill=\"").append(MUTED).append("\"/>")
                        .append("<text x=\"").append(PILL_RIGHT + 22).append("\" y=\"").append(t.y() + 4)
                        .append("\" font-size=\"12\" font-style=\"italic\" fill=\"").append(MUTED)
                        .append("\">insulate</text>\n");
            }
        }
        int laneIndex = 0;
        for (Map.Entry<DriverTerminal, List<Integer>> e : laneRows.entrySet()) {
            DriverTerminal term = e.getKey();
            // One lane per terminal in use, in terminal order (EnumMap iterates by ordinal).
            int lane = LANE_X + LANE_STEP * laneIndex++;
            int ty = termY.get(term);
            String color = wireColor(term);
            String dash = wireDash(term);
            int min = ty;
            int max = ty;
            for (int row : e.getValue()) {
                wires.append(line(PILL_RIGHT, row, lane, row, color, 2.2, dash));
                min = Math.min(min, row);
                max = Math.max(max, row);
            }
            wires.append(line(lane, min, lane, max, color, 2.2, dash));
            wires.append(line(lane, ty, TERM_X, ty, color, 2.2, dash));
            if (e.getValue().size() > 1) {
                for (int row : e.getValue()) {
                    wires.append(dot(lane, row, color));
                }
                wires.append(dot(lane, ty, color));
            }
        }
        for (Map.Entry<Integer, List<Integer>> e : tieRows.entrySet()) {
            int x = TIE_X + 10 * (e.getKey() % 2);
            int min = Integer.MAX_VALUE;
            int max = Integer.MIN_VALUE;
            for (int row : e.getValue()) {
                wires.append(line(PILL_RIGHT, row, x, row, INK, 2.4, null)).append(dot(x, row, INK));
                min = Math.min(min, row);
                max = Math.max(max, row);
            }
            wires.append(line(x, min, x, max, INK, 3.2, null));
            wires.append("<text x=\"").append(x + 6).append("\" y=\"").append((min + max) / 2 + 4)
                    .append("\" font-size=\"12\" font-weight=\"700\" fill=\"").append(INK).append("\">J")
                    .append(e.getKey() + 1).append("</text>\n");
        }

        StringBuilder tagsSvg = new StringBuilder();
        for (Tag t : tags) {
            drawTag(tagsSvg, t.lead(), t.y(), d.destination(t.lead()) instanceof WiringDiagram.Insulated);
        }
        // windings found so far, wired to nothing yet: no driver to draw
        boolean wired = !laneRows.isEmpty();
        StringBuilder driver = wired ? drawDriver(termY, laneRows) : new StringBuilder();

        int bottom = (wired ? Math.max(y, termY.values().stream().mapToInt(Integer::intValue).max().orElse(y) + 30)
                : y) + 24;
        StringBuilder legend = new StringBuilder();
        int ly = bottom;
        legend.append(line(24, ly - 4, 60, ly - 4, PHASE_A, 2.2, null)).append(text(66, ly, 12, MUTED, "phase A"))
                .append(line(140, ly - 4, 176, ly - 4, PHASE_B, 2.2, "7 4"))
                .append(text(182, ly, 12, MUTED, "phase B"))
                .append(startDot(262, ly - 4, d.startsKnown()))
                .append(text(272, ly, 12, MUTED, d.startsKnown() ? "coil start (dot end)"
                        : "coil start not known (guess)"))
                .append(text(d.startsKnown() ? 440 : 476, ly, 12, MUTED, "wires cross without a dot: not joined"));
        ly += 26;
        for (String s : d.summary()) {
            legend.append(text(24, ly, 14, INK, s));
            ly += 22;
        }
        int height = ly + 4;

        String title = text(24, 30, 16, INK, d.connection()).replace("<text ", "<text font-weight=\"700\" ");
        StringBuilder svg = new StringBuilder();
        svg.append("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ").append(WIDTH).append(' ')
                .append(height).append("\" font-family=\"system-ui, 'Segoe UI', Roboto, 'DejaVu Sans', sans-serif\"")
                .append(" class=\"wiring\">\n<title>").append(Html.escape(d.connection())).append("</title>\n")
                .append("<rect width=\"100%\" height=\"100%\" fill=\"#ffffff\"/>\n")
                .append(title).append('\n').append(body).append(caps).append(driver).append(wires).append(tagsSvg)
                .append(legend).append("</svg>");
        return new SvgFragment(svg.toString(), "Wiring diagram, " + d.connection() + ": "
                + String.join("; ", d.summary()) + (d.startsKnown() ? "." : "; coil starts not known (a guess)."));
    }

    private static void drawCoil(StringBuilder sb, WiringDiagram.Coil c, String name, int top, int bot,
                                 boolean startKnown) {
        boolean tapped = c.tapLead() != null;
        int loops = tapped ? 8 : 5;
        double bodyTop = top + 14;
        double bodyBot = bot - 14;
        double d = (bodyBot - bodyTop) / loops;
        String stroke = "A".equals(c.phase()) ? PHASE_A : PHASE_B;
        StringBuilder p = new StringBuilder();
        p.append("M").append(PILL_X).append(' ').append(top).append(" H").append(COIL_X).append(" V")
                .append(fmt(bodyTop));
        for (int i = 0; i < loops; i++) {
            // sweep 0: each loop bulges to the left, away from the lead tags
            p.append(" a").append(fmt(d / 2)).append(' ').append(fmt(d / 2)).append(" 0 0 0 0 ").append(fmt(d));
        }
        p.append(" V").append(bot).append(" H").append(PILL_X);
        sb.append("<path d=\"").append(p).append("\" fill=\"none\" stroke=\"").append(stroke)
                .append("\" stroke-width=\"2.2\" stroke-linejoin=\"round\"/>\n");
        if (tapped) {
            int mid = (top + bot) / 2;
            sb.append(line(COIL_X, mid, PILL_X, mid, stroke, 2.2, null)).append(dot(COIL_X, mid, stroke));
        }
        // Polarity dot beside the start of the coil; a guessed start is a hollow ring with a question mark.
        sb.append(startDot(COIL_X - 22, top + 10, startKnown));
        sb.append(text(COIL_X - 30, (top + bot) / 2 + 5, 14, INK, name).replace("<text ",
                "<text text-anchor=\"end\" font-weight=\"700\" "));
        sb.append(text(COIL_X + 6, top - 5, 11, MUTED, startKnown ? "start" : "start?"));
        if (tapped) {
            sb.append(text(COIL_X + 6, (top + bot) / 2 - 5, 11, MUTED, "tap"));
        }
        sb.append(text(COIL_X + 6, bot - 5, 11, MUTED, "end"));
    }

    /**
     * The resistance beside each segment of a coil, left of the loops: under the coil's name for a whole coil, at
     * the middle of each half for a tapped one. An inferred value is italic, grey and says "inferred".
     */
    private static void drawValues(StringBuilder sb, List<WiringDiagram.SegmentValue> values, int top, int bot) {
        int mid = (top + bot) / 2;
        int[] rows = values.size() == 1 ? new int[] {mid + 22} : new int[] {(top + mid) / 2 + 4, (mid + bot) / 2 + 4};
        for (int i = 0; i < values.size(); i++) {
            WiringDiagram.SegmentValue v = values.get(i);
            String t = text(COIL_X - 30, rows[i], 11, v.inferred() ? MUTED : INK,
                    v.inferred() ? v.text() + " inferred" : v.text());
            sb.append(t.replace("<text ", v.inferred() ? "<text class=\"value inferred\" text-anchor=\"end\" "
                    + "font-style=\"italic\" " : "<text class=\"value\" text-anchor=\"end\" "));
        }
    }

    /**
     * A coil that reads open: two dashed grey stubs from its leads that do not meet, a break mark between them and
     * the word "open" where the coil's name would be. An unknown end is named in words instead of a lead tag.
     */
    private static void drawBrokenCoil(StringBuilder sb, WiringDiagram.BrokenCoil c, int top, int bot) {
        int mid = (top + bot) / 2;
        sb.append("<g class=\"coil open\">");
        sb.append("<path d=\"M").append(PILL_X).append(' ').append(top).append(" H").append(COIL_X).append(" V")
                .append(mid - 12).append("\" fill=\"none\" stroke=\"").append(MUTED)
                .append("\" stroke-width=\"2.2\" stroke-dasharray=\"5 3\"/>");
        sb.append("<path d=\"M").append(c.endLead() != null ? PILL_X : COIL_X + 10).append(' ').append(bot)
                .append(" H").append(COIL_X).append(" V").append(mid + 12).append("\" fill=\"none\" stroke=\"")
                .append(MUTED).append("\" stroke-width=\"2.2\" stroke-dasharray=\"5 3\"/>");
        // the break: two short slashes across the gap
        sb.append(line(COIL_X - 7, mid - 4, COIL_X + 7, mid - 10, INK, 1.6, null))
                .append(line(COIL_X - 7, mid + 10, COIL_X + 7, mid + 4, INK, 1.6, null));
        sb.append(text(COIL_X - 30, mid + 5, 14, INK, "open").replace("<text ",
                "<text text-anchor=\"end\" font-weight=\"700\" "));
        if (c.endLead() == null) {
            sb.append(text(COIL_X + 16, bot + 4, 12, MUTED, c.endNote()).replace("<text ",
                    "<text font-style=\"italic\" "));
        }
        sb.append("</g>\n");
    }

    private static void drawPhaseLabel(StringBuilder sb, String phase, int top, int bot) {
        int mid = (top + bot) / 2;
        sb.append("<path d=\"M58 ").append(top).append(" H52 V").append(bot).append(" H58\" fill=\"none\" stroke=\"")
                .append(MUTED).append("\" stroke-width=\"1.2\"/>\n");
        sb.append("<text x=\"36\" y=\"").append(mid).append("\" font-size=\"13\" fill=\"").append(MUTED)
                .append("\" text-anchor=\"middle\" transform=\"rotate(-90 36 ").append(mid).append(")\">Phase ")
                .append(Html.escape(phase)).append("</text>\n");
    }

    private static Map<DriverTerminal, Integer> terminalRows(WiringDiagram d, Map<String, int[]> phaseSpan,
                                                             List<Tag> tags) {
        Map<DriverTerminal, Integer> rows = new EnumMap<>(DriverTerminal.class);
        int[] a = phaseSpan.getOrDefault("A", new int[] {56, 150});
        int[] b = phaseSpan.getOrDefault("B", new int[] {a[1] + 40, a[1] + 134});
        int am = (a[0] + a[1]) / 2;
        int bm = (b[0] + b[1]) / 2;
        boolean unipolar = !d.leadsAt(DriverTerminal.A).isEmpty() || !d.leadsAt(DriverTerminal.A_PRIME).isEmpty()
                || !d.leadsAt(DriverTerminal.B).isEmpty() || !d.leadsAt(DriverTerminal.B_PRIME).isEmpty();
        List<Integer> taken = new ArrayList<>();
        place(rows, taken, tags, unipolar ? DriverTerminal.A : DriverTerminal.A_PLUS, am - 20);
        place(rows, taken, tags, unipolar ? DriverTerminal.A_PRIME : DriverTerminal.A_MINUS, am + 20);
        if (!d.leadsAt(DriverTerminal.COMMON).isEmpty()) {
            place(rows, taken, tags, DriverTerminal.COMMON, (a[1] + b[0]) / 2);
        }
        place(rows, taken, tags, unipolar ? DriverTerminal.B : DriverTerminal.B_PLUS, bm - 20);
        place(rows, taken, tags, unipolar ? DriverTerminal.B_PRIME : DriverTerminal.B_MINUS, bm + 20);
        // A terminal used by the wiring but not in the usual set (a mixed diagram) still gets a row.
        for (DriverTerminal t : DriverTerminal.values()) {
            if (!rows.containsKey(t) && !d.leadsAt(t).isEmpty()) {
                place(rows, taken, tags, t, "A".equals(t.phase()) ? am : bm);
            }
        }
        return rows;
    }

    /**
     * Puts a terminal near its wanted row, but never on a lead-tag row (a lead wire running on to a farther lane
     * would lie on top of the terminal's wire) nor within a terminal's height of another terminal.
     */
    private static void place(Map<DriverTerminal, Integer> rows, List<Integer> taken, List<Tag> tags,
                              DriverTerminal t, int wanted) {
        for (int k = 0; k < 200; k++) {
            int y = wanted + (k % 2 == 0 ? 1 : -1) * ((k + 1) / 2) * 2;
            boolean clear = tags.stream().allMatch(tag -> Math.abs(tag.y() - y) >= 14)
                    && taken.stream().allMatch(o -> Math.abs(o - y) >= 32);
            if (clear) {
                rows.put(t, y);
                taken.add(y);
                return;
            }
        }
        rows.put(t, wanted);
        taken.add(wanted);
    }

    private static StringBuilder drawDriver(Map<DriverTerminal, Integer> termY,
                                            Map<DriverTerminal, List<Integer>> used) {
        StringBuilder sb = new StringBuilder();
        int min = termY.values().stream().mapToInt(Integer::intValue).min().orElse(60);
        int max = termY.values().stream().mapToInt(Integer::intValue).max().orElse(200);
        sb.append("<rect x=\"").append(TERM_X - 10).append("\" y=\"").append(min - 44).append("\" width=\"")
                .append(TERM_W + 30).append("\" height=\"").append(max - min + 70)
                .append("\" rx=\"6\" fill=\"#f5f4ef\" stroke=\"").append(MUTED).append("\" stroke-width=\"1.2\"/>\n");
        sb.append(text(TERM_X + 4, min - 24, 13, INK, "Driver").replace("<text ", "<text font-weight=\"700\" "));
        for (Map.Entry<DriverTerminal, Integer> e : termY.entrySet()) {
            int ty = e.getValue();
            boolean isUsed = used.containsKey(e.getKey());
            sb.append("<rect x=\"").append(TERM_X).append("\" y=\"").append(ty - 13).append("\" width=\"")
                    .append(TERM_W).append("\" height=\"26\" rx=\"3\" fill=\"#ffffff\" stroke=\"").append(INK)
                    .append("\" stroke-width=\"1.2\"").append(isUsed ? "" : " stroke-dasharray=\"3 2\"")
                    .append("/>\n<circle cx=\"").append(TERM_X + 13).append("\" cy=\"").append(ty)
                    .append("\" r=\"5\" fill=\"#ffffff\" stroke=\"").append(INK).append("\" stroke-width=\"1.2\"/>")
                    .append(line(TERM_X + 9, ty + 4, TERM_X + 17, ty - 4, INK, 1.2, null));
            sb.append(text(TERM_X + 26, ty + 5, 14, INK, e.getKey().label())
                    .replace("<text ", "<text font-weight=\"700\" "));
        }
        return sb;
    }

    private static void drawTag(StringBuilder sb, String lead, int y, boolean insulated) {
        String swatch = swatch(lead);
        sb.append("<g class=\"lead\"><title>lead ").append(Html.escape(lead)).append("</title>")
                .append("<rect x=\"").append(PILL_X).append("\" y=\"").append(y - 12).append("\" width=\"")
                .append(PILL_W).append("\" height=\"24\" rx=\"12\" fill=\"").append(insulated ? "#f5f4ef" : "#ffffff")
                .append("\" stroke=\"").append(insulated ? MUTED : INK).append("\" stroke-width=\"1.3\"")
                .append(insulated ? " stroke-dasharray=\"3 2\"" : "").append("/>");
        int tx = PILL_X + 10;
        if (swatch != null) {
            sb.append("<circle cx=\"").append(PILL_X + 14).append("\" cy=\"").append(y).append("\" r=\"6\" fill=\"")
                    .append(swatch).append("\" stroke=\"").append(INK).append("\" stroke-width=\"1\"/>");
            tx = PILL_X + 25;
        }
        int room = PILL_RIGHT - 8 - tx;
        sb.append("<text x=\"").append(tx).append("\" y=\"").append(y + 5).append("\" font-size=\"14\" fill=\"")
                .append(insulated ? MUTED : INK).append('"');
        // Long labels are squeezed to fit the tag rather than cut, so no part of a label is lost.
        if (lead.codePointCount(0, lead.length()) * 8 > room) {
            sb.append(" textLength=\"").append(room).append("\" lengthAdjust=\"spacingAndGlyphs\"");
        }
        sb.append('>').append(Html.escape(lead)).append("</text></g>\n");
    }

    /** The swatch colour for a label whose first word is a wire colour, or null. */
    static String swatch(String lead) {
        String[] words = lead.toLowerCase(Locale.ROOT).split("[^a-z]+");
        for (String w : words) {
            if (!w.isEmpty()) {
                return SWATCH.get(w);
            }
        }
        return null;
    }

    private static String wireColor(DriverTerminal t) {
        return switch (t.phase()) {
            case "A" -> PHASE_A;
            case "B" -> PHASE_B;
            default -> MUTED;
        };
    }

    private static String wireDash(DriverTerminal t) {
        return switch (t.phase()) {
            case "A" -> null;
            case "B" -> "7 4";
            default -> "2 3 8 3";
        };
    }

    private static String line(double x1, double y1, double x2, double y2, String color, double width, String dash) {
        return "<line x1=\"" + fmt(x1) + "\" y1=\"" + fmt(y1) + "\" x2=\"" + fmt(x2) + "\" y2=\"" + fmt(y2)
                + "\" stroke=\"" + color + "\" stroke-width=\"" + fmt(width) + "\""
                + (dash == null ? "" : " stroke-dasharray=\"" + dash + "\"") + "/>\n";
    }

    /** A known coil start is a filled dot; a guessed one a ring with a question mark, distinct in grey-scale too. */
    private static String startDot(int x, int y, boolean known) {
        if (known) {
            return "<circle cx=\"" + x + "\" cy=\"" + y + "\" r=\"3.5\" fill=\"" + INK + "\"/>\n";
        }
        return "<g class=\"start-unknown\"><circle cx=\"" + x + "\" cy=\"" + y + "\" r=\"6\" fill=\"#ffffff\" stroke=\""
                + INK + "\" stroke-width=\"1.2\" stroke-dasharray=\"2 1.5\"/><text x=\"" + x + "\" y=\"" + (y + 4)
                + "\" font-size=\"10\" font-weight=\"700\" text-anchor=\"middle\" fill=\"" + INK + "\">?</text></g>\n";
    }

    private static String dot(int x, int y, String color) {
        return "<circle cx=\"" + x + "\" cy=\"" + y + "\" r=\"4\" fill=\"" + color + "\"/>\n";
    }

    private static String text(int x, int y, int size, String color, String s) {
        return "<text x=\"" + x + "\" y=\"" + y + "\" font-size=\"" + size + "\" fill=\"" + color + "\">"
                + Html.escape(s) + "</text>\n";
    }

    private static String fmt(double v) {
        if (v == Math.rint(v)) {
            return Long.toString((long) v);
        }
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
