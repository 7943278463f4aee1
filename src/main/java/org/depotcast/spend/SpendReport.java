package org.depotcast.spend;

import org.depotcast.common.CsvExport;
import org.depotcast.core.spend.SpendSimulation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Spend results as CSV for a spreadsheet and as one printable HTML page with a chart of spend per year. */
final class SpendReport {
    private SpendReport() {
    }

    static CsvExport csv(long runId, SpendResults r) {
        List<List<?>> rows = new ArrayList<>();
        for (SpendResults.Year y : r.years()) {
            rows.add(row(y, "total", "all", y.total(), r.currency()));
            y.families().forEach((k, s) -> rows.add(row(y, "family", k, s, r.currency())));
            y.parts().forEach((k, s) -> rows.add(row(y, "part", k, s, r.currency())));
            y.depots().forEach((k, s) -> rows.add(row(y, "depot", k, s, r.currency())));
        }
        return new CsvExport("spend-run-" + runId + ".csv", List.of("financial_year", "months", "level", "key", "mean",
                "p2_5", "p10", "p50", "p90", "p97_5", "currency"), rows);
    }

    private static List<?> row(SpendResults.Year y, String level, String key, SpendSimulation.Summary s, String currency) {
        return List.of(y.label(), y.months(), level, key, money(s.mean()), money(s.p2_5()), money(s.p10()),
                money(s.p50()), money(s.p90()), money(s.p97_5()), currency);
    }

    static String html(SpendResults r) {
        StringBuilder h = new StringBuilder();
        String c = r.currency();
        h.append("<!doctype html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>Parts spend projection: ")
                .append(escape(r.scenario())).append("</title><style>body{font-family:sans-serif;margin:2em;color:#222}"
                        + "table{border-collapse:collapse;margin:1em 0}td,th{border:1px solid #999;padding:4px 8px;text-align:right}"
                        + "th:first-child,td:first-child{text-align:left}.note{font-size:90%;color:#444}</style></head><body>");
        h.append("<h1>Parts spend projection</h1><p>Scenario <strong>").append(escape(r.scenario()))
                .append("</strong>, in ").append(escape(r.currency())).append(", ").append(r.draws())
                .append(" Monte Carlo draws (seed ").append(r.seed()).append(").</p>");
        h.append(chart(r));
        h.append("<h2>Total per financial year</h2><table><tr><th>Financial year</th><th>Months</th><th>Expected</th>"
                + "<th>80% range</th><th>95% range</th></tr>");
        for (SpendResults.Year y : r.years()) {
            h.append("<tr><td>").append(escape(y.label())).append("</td><td>").append(escape(y.months())).append("</td><td>")
                    .append(shown(y.total().mean(), c)).append("</td><td>")
                    .append(shown(y.total().p10(), c)).append(" – ").append(grouped(y.total().p90())).append("</td><td>")
                    .append(shown(y.total().p2_5(), c)).append(" – ").append(grouped(y.total().p97_5())).append("</td></tr>");
        }
        h.append("</table><h2>Per component family (expected, 80% range)</h2><table><tr><th>Family</th>");
        r.years().forEach(y -> h.append("<th>").append(escape(y.label())).append("<br><small>")
                .append(escape(y.months())).append("</small></th>"));
        h.append("</tr>");
        for (String family : r.years().get(0).families().keySet()) {
            h.append("<tr><td>").append(family.toLowerCase(Locale.ROOT).replace('_', ' ')).append("</td>");
            for (SpendResults.Year y : r.years()) {
                SpendSimulation.Summary s = y.families().get(family);
                h.append("<td>").append(s == null ? "–" : shown(s.mean(), c) + "<br><small>" + grouped(s.p10()) + " – "
                        + grouped(s.p90()) + "</small>").append("</td>");
            }
            h.append("</tr>");
        }
        h.append("</table>");
        r.notes().forEach(n -> h.append("<p class=\"note\">").append(escape(n)).append("</p>"));
        h.append("<p class=\"note\">Parts figures only: labour, transport and the work itself are not included. Repairs "
                + "on boreholes and hand pumps, and any part in contact with drinking water, follow local codes, national "
                + "drinking-water quality rules and trained, licensed practice.</p></body></html>");
        return h.toString();
    }

    /** Bars of expected spend per year with the 95% range as a whisker and the 80% range as a thicker band. */
    private static String chart(SpendResults r) {
        double max = r.years().stream().mapToDouble(y -> y.total().p97_5()).max().orElse(1);
        int width = 120 * r.years().size() + 80, height = 260;
        StringBuilder svg = new StringBuilder("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"" + width
                + "\" height=\"" + height + "\" role=\"img\" aria-label=\"Expected parts spend per year with ranges\">");
        svg.append("<line x1=\"60\" y1=\"220\" x2=\"").append(width - 10).append("\" y2=\"220\" stroke=\"#333\"/>");
        for (int i = 0; i < r.years().size(); i++) {
            SpendResults.Year y = r.years().get(i);
            double x = 80 + i * 120;
            double top = 220 - 200 * y.total().mean() / max;
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.0f\" y=\"%.1f\" width=\"60\" height=\"%.1f\" fill=\"#8aa8c8\"/>",
                    x, top, 220 - top));
            double lo95 = 220 - 200 * y.total().p2_5() / max, hi95 = 220 - 200 * y.total().p97_5() / max;
            double lo80 = 220 - 200 * y.total().p10() / max, hi80 = 220 - 200 * y.total().p90() / max;
            svg.append(String.format(Locale.ROOT, "<line x1=\"%.0f\" y1=\"%.1f\" x2=\"%.0f\" y2=\"%.1f\" stroke=\"#222\"/>",
                    x + 30, lo95, x + 30, hi95));
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.0f\" y=\"%.1f\" width=\"8\" height=\"%.1f\" fill=\"#222\"/>",
                    x + 26, hi80, Math.max(1, lo80 - hi80)));
            svg.append(String.format(Locale.ROOT, "<text x=\"%.0f\" y=\"240\" font-size=\"12\">%s</text>", x + 4,
                    escape(y.label() + (y.partial() ? " (part)" : ""))));
            svg.append(String.format(Locale.ROOT, "<text x=\"%.0f\" y=\"%.1f\" font-size=\"11\">%s</text>", x, top - 4,
                    escape(r.currency()) + " " + String.format(Locale.ROOT, "%,.0f", y.total().mean())));
        }
        return svg.append("</svg>").toString();
    }

    /** Plain figures for the CSV, which a spreadsheet reads: no thousands separators, no currency. */
    private static String money(double value) {
        return String.format(Locale.ROOT, "%.2f", value);
    }

    /**
     * Figures for people on the printed page: thousands separators, whole currency units ("1,685,746"), as the spend
     * page shows a projection (cents of a projected year mean nothing).
     */
    static String grouped(double value) {
        return String.format(Locale.ROOT, "%,.0f", value);
    }

    /** An amount with its currency before it ("KES 1,685,746"), as the pages show money. */
    static String shown(double value, String currency) {
        return escape(currency) + " " + grouped(value);
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    /**
     * Runs side by side, the first as the baseline: each run's currency and financial-year periods with their totals,
     * and per period the difference from the baseline's same period only when both are in the same currency (amounts
     * in different currencies are never added or subtracted; no exchange rate is assumed).
     */
    static List<Map<String, Object>> compare(List<SpendResults> runs) {
        SpendResults baseline = runs.get(0);
        List<Map<String, Object>> rows = new ArrayList<>();
        for (SpendResults r : runs) {
            Map<String, Object> row = new java.util.LinkedHashMap<>();
            row.put("scenario", r.scenario());
            row.put("currency", r.currency());
            row.put("financialYearStartMonth", r.financialYearStartMonth());
            boolean comparable = r.currency().equals(baseline.currency());
            List<Map<String, Object>> years = new ArrayList<>();
            double total = 0;
            for (SpendResults.Year y : r.years()) {
                Map<String, Object> cell = new java.util.LinkedHashMap<>();
                cell.put("financialYear", y.label());
                cell.put("months", y.months());
                cell.put("total", y.total());
                SpendResults.Year same = baseline.years().stream().filter(b -> b.months().equals(y.months())).findFirst().orElse(null);
                cell.put("differenceFromBaseline", comparable && same != null ? y.total().mean() - same.total().mean() : null);
                years.add(cell);
                total += y.total().mean();
            }
            row.put("years", years);
            row.put("expectedTotal", total);
            if (!comparable) {
                row.put("note", "in " + r.currency() + ", the baseline in " + baseline.currency()
                        + ": not compared, since no exchange rate is assumed");
            }
            rows.add(row);
        }
        return rows;
    }
}
