package org.lodestep.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/** A table for a report: a caption, column headings (units in them), rows of {@link Cell}s, optional row status. */
public final class HtmlTable {
    private final String caption;
    private final List<String> columns;
    private final List<List<Cell>> rows;
    private final List<Status> rowStatus;
    /** Tables with this many columns or more stack into labelled cards at phone width. */
    static final int STACK_FROM_COLUMNS = 6;

    private HtmlTable(Builder b) {
        this.caption = b.caption;
        this.columns = List.copyOf(b.columns);
        this.rows = List.copyOf(b.rows);
        this.rowStatus = new ArrayList<>(b.rowStatus);
    }

    /** Starts a table; the caption may be null. */
    public static Builder builder(String caption, String... columns) {
        return new Builder(caption, List.of(columns));
    }

    /** Number of body rows. */
    public int rowCount() {
        return rows.size();
    }

    void render(StringBuilder sb) {
        // a wide table stacks on a phone (each row a card of labelled values, so the verdict and value columns
        // stay in view); a narrower one scrolls in its own box with its first column held
        boolean stack = columns.size() >= STACK_FROM_COLUMNS;
        sb.append("<div class=\"table-wrap\"><table").append(stack ? " class=\"stack\"" : "").append('>');
        if (caption != null) {
            sb.append("<caption>").append(Html.escape(caption)).append("</caption>");
        }
        sb.append("<thead><tr>");
        for (String c : columns) {
            sb.append("<th scope=\"col\">").append(Html.escape(c)).append("</th>");
        }
        sb.append("</tr></thead><tbody>");
        for (int r = 0; r < rows.size(); r++) {
            Status s = rowStatus.get(r);
            sb.append(s == null ? "<tr>" : "<tr class=\"row-" + s.cssClass() + "\">");
            List<Cell> cells = rows.get(r);
            for (int i = 0; i < cells.size(); i++) {
                cells.get(i).render(sb, "td", stack ? columns.get(i) : null);
            }
            sb.append("</tr>");
        }
        sb.append("</tbody></table></div>\n");
    }

    /** Collects the rows of one table. */
    public static final class Builder {
        private final String caption;
        private final List<String> columns;
        private final List<List<Cell>> rows = new ArrayList<>();
        private final List<Status> rowStatus = new ArrayList<>();

        private Builder(String caption, List<String> columns) {
            if (columns.isEmpty()) {
                throw new IllegalArgumentException("a table needs at least one column");
            }
            this.caption = caption;
            this.columns = columns;
        }

        /** Adds a row; it must have one cell per column. */
        public Builder row(Cell... cells) {
            return row(null, cells);
        }

        /** Adds a row whose whole line is marked (a thick left rule whose pattern differs by status). */
        public Builder row(Status status, Cell... cells) {
            if (cells.length != columns.size()) {
                throw new IllegalArgumentException("row has " + cells.length + " cells, table has " + columns.size()
                        + " columns");
            }
            for (Cell c : cells) {
                Objects.requireNonNull(c, "cell");
            }
            rows.add(List.of(cells));
            rowStatus.add(status);
            return this;
        }

        /** Adds a row of plain text cells. */
        public Builder row(String... texts) {
            Cell[] cells = new Cell[texts.length];
            for (int i = 0; i < texts.length; i++) {
                cells[i] = Cell.text(texts[i]);
            }
            return row(cells);
        }

        public HtmlTable build() {
            return new HtmlTable(this);
        }
    }
}
