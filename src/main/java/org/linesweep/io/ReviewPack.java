package org.linesweep.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.linesweep.design.Design;
import org.linesweep.design.GeometryField;
import org.linesweep.design.ModelNotes;
import org.linesweep.design.Units;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LinePoint;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.PairModes;
import org.linesweep.physics.PhysicalConstants;
import org.linesweep.signal.ScatteringSweep;
import org.linesweep.signal.Waveform;
import org.linesweep.signal.WaveformSettings;
import org.linesweep.sweep.SweepResult;

/**
 * Everything a design review needs, from one action: a one-page HTML summary that opens in any browser, and
 * beside it the plots (PNG, when the caller has them), the limits and parameter tables (CSV), the sweep of
 * each design (CSV), the line as a Touchstone two-port (.s2p) and the live design file. Every file is written
 * atomically; the files share the HTML file's base name, so one pack never overwrites another's parts.
 */
public final class ReviewPack {

    /** One design in the pack: the live one or a pin. */
    public record Entry(String label, Design design, SweepResult sweep, FrequencyLimits limits) {

        /** An entry computed from the design: its sweep (with a pair's columns) and its limits. */
        public static Entry compute(String label, Design design) {
            LineModel model = design.toModel();
            return new Entry(label, design, new org.linesweep.sweep.SweepEngine().run(model, design.toPair(),
                    design.sweep().grid().frequencies(), design.lengthMetres()),
                    org.linesweep.physics.LimitFinder.find(model, design.lengthMetres(), design.threshold(),
                            design.lossBudgetDb()));
        }
    }

    /** The optional time-domain part: what was asked and what came out. */
    public record TimeDomainPart(WaveformSettings settings, Waveform waveform) {
    }

    private ReviewPack() {
    }

    /**
     * Writes the pack.
     *
     * @param html the summary's path; the other files go beside it with its base name
     * @param live the live design
     * @param pins the pinned designs (may be empty)
     * @param plotsPng the plots as PNG bytes, or null when there is no window to draw them
     * @param timeDomain the time-domain part, or null
     * @param referenceOhm the Touchstone reference impedance
     * @return the files written, the summary first
     */
    public static List<Path> write(Path html, Entry live, List<Entry> pins, byte[] plotsPng, TimeDomainPart timeDomain,
            double referenceOhm) throws IOException {
        String base = html.getFileName().toString().replaceFirst("(?i)\\.html?$", "");
        Path folder = html.toAbsolutePath().getParent();
        List<Entry> all = new ArrayList<>();
        all.add(live);
        all.addAll(pins);
        Map<String, Path> files = new LinkedHashMap<>();
        if (plotsPng != null) {
            files.put("plots", write(folder.resolve(base + "-plots.png"), out -> out.write(plotsPng)));
        }
        files.put("limits", write(folder.resolve(base + "-limits.csv"), out -> writeLimits(all, out)));
        files.put("parameters", write(folder.resolve(base + "-parameters.csv"), out -> writeParameters(all, out)));
        for (int i = 0; i < all.size(); i++) {
            Entry entry = all.get(i);
            String suffix = i == 0 ? "" : "-pin" + i;
            files.put("sweep" + suffix, write(folder.resolve(base + suffix + "-sweep.csv"),
                    out -> SweepTable.writeCsv(entry.sweep(), out)));
            ScatteringSweep s = ScatteringSweep.of(entry.design().toModel(), entry.design().lengthMetres(),
                    entry.design().sweep().grid().frequencies(), referenceOhm);
            files.put("s2p" + suffix, write(folder.resolve(base + suffix + ".s2p"),
                    out -> Touchstone.write(s, Touchstone.header(entry.design(), referenceOhm), out)));
        }
        files.put("design", write(folder.resolve(base + "-design.json"),
                out -> out.write(DesignFiles.toJson(live.design()).getBytes(StandardCharsets.UTF_8))));
        if (timeDomain != null) {
            files.put("waveform", write(folder.resolve(base + "-waveform.csv"),
                    out -> WaveformTable.writeCsv(timeDomain.waveform(), out)));
        }
        AtomicFiles.write(html, out -> writeHtml(all, files, timeDomain, referenceOhm, out));
        List<Path> written = new ArrayList<>();
        written.add(html);
        written.addAll(files.values());
        return written;
    }

    private static Path write(Path path, AtomicFiles.Content content) throws IOException {
        AtomicFiles.write(path, content);
        return path;
    }

    /** The limits table: one row per design. */
    static void writeLimits(List<Entry> entries, OutputStream stream) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8));
        out.println("design,lumped_up_to_hz,skin_depth_equals_radius_hz,resistance_doubles_hz,higher_mode_hz,"
                + "loss_budget_hz,ceiling_hz,limited_by");
        for (Entry e : entries) {
            FrequencyLimits l = e.limits();
            out.println(String.join(",", csv(e.label()), cell(l.electricalLengthHz()), cell(l.skinDepthEqualsRadiusHz()),
                    cell(l.resistanceDoublesHz()), cell(l.higherModeCutoffHz()), cell(l.lossBudgetHz()),
                    cell(l.ceilingHz()), l.limitedBy() == null ? "" : l.limitedBy().key()));
        }
        out.flush();
    }

    /** The parameter table: one row per input, one column per design. */
    static void writeParameters(List<Entry> entries, OutputStream stream) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8));
        List<String> header = new ArrayList<>(List.of("parameter"));
        entries.forEach(e -> header.add(csv(e.label())));
        out.println(String.join(",", header));
        for (Map.Entry<String, List<String>> row : parameterRows(entries).entrySet()) {
            List<String> cells = new ArrayList<>(List.of(csv(row.getKey())));
            row.getValue().forEach(v -> cells.add(csv(v)));
            out.println(String.join(",", cells));
        }
        out.flush();
    }

    /** Parameter name → its value in each design, in words with units. */
    static Map<String, List<String>> parameterRows(List<Entry> entries) {
        Map<String, List<String>> rows = new LinkedHashMap<>();
        for (int i = 0; i < entries.size(); i++) {
            Design d = entries.get(i).design();
            put(rows, "line type", i, entries.size(), d.geometry().type().key() + (d.geometry().isPair() ? " pair" : ""));
        }
        // every design's geometry rows before the rest, so a pin's extra field (a pair's gap) sits with them
        for (int i = 0; i < entries.size(); i++) {
            Design d = entries.get(i).design();
            for (GeometryField field : d.geometry().fields()) {
                put(rows, field.label(), i, entries.size(), Units.engineering(d.geometry().value(field.name()), "m", 4));
            }
        }
        for (int i = 0; i < entries.size(); i++) {
            Design d = entries.get(i).design();
            put(rows, "length", i, entries.size(), Units.engineering(d.lengthMetres(), "m", 4));
            put(rows, "conductor", i, entries.size(), d.conductor().materialKey() == null
                    ? String.format(Locale.ROOT, "custom, %.4g S/m", d.conductor().conductivitySiemensPerMetre())
                    : d.conductor().materialKey());
            put(rows, "roughness (RMS)", i, entries.size(), Units.engineering(d.conductor().roughnessRmsMetres(), "m", 3));
            put(rows, "temperature", i, entries.size(), String.format(Locale.ROOT, "%.1f degC",
                    d.temperatureKelvin() - PhysicalConstants.ZERO_CELSIUS_KELVIN));
            put(rows, "dielectric", i, entries.size(), d.dielectric().materialKey() == null ? "custom"
                    : d.dielectric().materialKey());
            put(rows, "permittivity εr", i, entries.size(), String.format(Locale.ROOT, "%.4g",
                    d.dielectric().relativePermittivity()));
            put(rows, "loss tangent", i, entries.size(), String.format(Locale.ROOT, "%.4g", d.dielectric().lossTangent()));
            put(rows, "dielectric model", i, entries.size(), d.dielectric().model().key());
            put(rows, "sweep", i, entries.size(), Units.engineering(d.sweep().fromHz(), "Hz", 4) + " to "
                    + Units.engineering(d.sweep().toHz(), "Hz", 4) + ", " + d.sweep().points() + " points");
            put(rows, "L/λ threshold", i, entries.size(), String.format(Locale.ROOT, "%.4g", d.threshold()));
            put(rows, "loss budget", i, entries.size(), Double.isNaN(d.lossBudgetDb()) ? "none"
                    : String.format(Locale.ROOT, "%.4g dB", d.lossBudgetDb()));
        }
        return rows;
    }

    private static void put(Map<String, List<String>> rows, String name, int column, int columns, String value) {
        List<String> row = rows.computeIfAbsent(name, k -> {
            List<String> empty = new ArrayList<>();
            for (int i = 0; i < columns; i++) {
                empty.add("");
            }
            return empty;
        });
        row.set(column, value);
    }

    private static String cell(double value) {
        return Double.isFinite(value) ? Double.toString(value) : "";
    }

    private static String csv(String text) {
        if (text.contains(",") || text.contains("\"") || text.contains("\n")) {
            return "\"" + text.replace("\"", "\"\"") + "\"";
        }
        return text;
    }

    private static String hz(double value) {
        return Double.isFinite(value) ? Units.engineering(value, "Hz", 4) : "—";
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    private static String ceilingSentence(Entry e) {
        FrequencyLimits l = e.limits();
        if (!Double.isFinite(l.ceilingHz())) {
            return "No frequency ceiling between 1 Hz and 10 THz.";
        }
        String reason = switch (l.limitedBy()) {
            case ELECTRICAL_LENGTH -> "the electrical length reaching L/λ = "
                    + String.format(Locale.ROOT, "%.4g", e.design().threshold()) + " (above it the line is not lumped)";
            case HIGHER_ORDER_MODE -> "the first higher-order mode (above it the TEM model does not hold)";
            case LOSS_BUDGET -> "the " + String.format(Locale.ROOT, "%.4g", e.design().lossBudgetDb()) + " dB loss budget";
        };
        return "Frequency ceiling " + hz(l.ceilingHz()) + ", set by " + reason + ".";
    }

    private static void writeHtml(List<Entry> entries, Map<String, Path> files, TimeDomainPart timeDomain,
            double referenceOhm, OutputStream stream) {
        Entry live = entries.get(0);
        Design design = live.design();
        PrintWriter out = new PrintWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8));
        String title = design.name().isEmpty() ? "Unnamed design" : design.name();
        out.println("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">");
        out.println("<title>Review: " + escape(title) + "</title>");
        out.println("<style>body{font-family:system-ui,sans-serif;max-width:1100px;margin:1.5em auto;padding:0 1em;"
                + "color:#1b1f29;line-height:1.4}h1{margin-bottom:.1em}h2{border-bottom:1px solid #ccd;margin-top:1.4em}"
                + "table{border-collapse:collapse;margin:.4em 0}td,th{border:1px solid #ccd;padding:.2em .6em;"
                + "text-align:left;vertical-align:top}th{background:#eef1f7}.ceiling{font-size:1.25em;font-weight:600;"
                + "background:#eef4ff;padding:.5em .8em;border-left:5px solid #17408b}.warn{color:#8a3b00}"
                + ".caution{background:#fff6e5;border-left:5px solid #c77700;padding:.4em .8em}img{max-width:100%;"
                + "border:1px solid #ccd}.small{color:#555;font-size:.9em}</style></head><body>");
        out.println("<h1>" + escape(title) + "</h1>");
        if (!design.description().isEmpty()) {
            out.println("<p>" + escape(design.description()) + "</p>");
        }
        out.println("<p class=\"small\">LineSweep review pack, " + escape(ZonedDateTime.now()
                .format(DateTimeFormatter.RFC_1123_DATE_TIME)) + ". Line: " + escape(design.geometry().type().key())
                + (design.geometry().isPair() ? " (edge-coupled pair)" : "") + ", "
                + escape(Units.engineering(design.lengthMetres(), "m", 4)) + " long.</p>");
        out.println("<p class=\"ceiling\">" + escape(ceilingSentence(live)) + "</p>");
        if (files.containsKey("plots")) {
            out.println("<img src=\"" + escape(files.get("plots").getFileName().toString())
                    + "\" alt=\"attenuation, velocity, impedance and per-unit-length plots against frequency\">");
        } else {
            out.println("<p class=\"small\">Plots: not included (this pack was written without the explorer"
                    + " window; export them from the explorer).</p>");
        }

        out.println("<h2>Limits</h2><table><tr><th>design</th><th>lumped up to (L/λ)</th><th>δ = r</th>"
                + "<th>R = 2R<sub>dc</sub></th><th>1st higher mode</th><th>loss budget</th><th>ceiling</th>"
                + "<th>set by</th></tr>");
        for (Entry e : entries) {
            FrequencyLimits l = e.limits();
            out.println("<tr><td>" + escape(e.label()) + "</td><td>" + hz(l.electricalLengthHz()) + "</td><td>"
                    + hz(l.skinDepthEqualsRadiusHz()) + "</td><td>" + hz(l.resistanceDoublesHz()) + "</td><td>"
                    + hz(l.higherModeCutoffHz()) + "</td><td>" + hz(l.lossBudgetHz()) + "</td><td><b>"
                    + hz(l.ceilingHz()) + "</b></td><td>" + (l.limitedBy() == null ? "—" : l.limitedBy().key())
                    + "</td></tr>");
        }
        out.println("</table>");

        out.println("<h2>Parameters</h2><table><tr><th>parameter</th>");
        for (Entry e : entries) {
            out.print("<th>" + escape(e.label()) + "</th>");
        }
        out.println("</tr>");
        for (Map.Entry<String, List<String>> row : parameterRows(entries).entrySet()) {
            out.print("<tr><td>" + escape(row.getKey()) + "</td>");
            row.getValue().forEach(v -> out.print("<td>" + escape(v) + "</td>"));
            out.println("</tr>");
        }
        out.println("</table>");

        writeKeyValues(out, live);
        if (timeDomain != null) {
            Waveform w = timeDomain.waveform();
            WaveformSettings s = timeDomain.settings();
            out.println("<h2>Time domain</h2><p>" + escape(s.shape().key()) + " of 1 V, rise (10-90 %) "
                    + escape(Units.engineering(s.riseSeconds(), "s", 4)) + ", source "
                    + escape(Units.engineering(s.sourceOhm(), "ohm", 4)) + ", load "
                    + escape(Double.isInfinite(s.loadOhm()) ? "open" : Units.engineering(s.loadOhm(), "ohm", 4))
                    + (s.loadFarad() > 0 ? " with " + escape(Units.engineering(s.loadFarad(), "F", 4)) : "")
                    + ". Far end: delay <b>" + escape(Units.engineering(w.delaySeconds(), "s", 4))
                    + "</b>, rise 10-90 % <b>" + escape(Units.engineering(w.outputRiseSeconds(), "s", 4))
                    + "</b>, overshoot <b>" + String.format(Locale.ROOT, "%.1f %%", w.overshootPercent())
                    + "</b>. Samples in " + escape(files.get("waveform").getFileName().toString()) + ".</p>");
            for (String warning : w.warnings()) {
                out.println("<p class=\"warn\">" + escape(warning) + "</p>");
            }
        }

        out.println("<h2>Validity</h2>");
        for (Entry e : entries) {
            List<String> warnings = e.design().warnings();
            out.println("<p><b>" + escape(e.label()) + "</b>: " + (warnings.isEmpty()
                    ? "inside every model's stated range." : "") + "</p>");
            if (!warnings.isEmpty()) {
                out.println("<ul>");
                warnings.forEach(w -> out.println("<li class=\"warn\">" + escape(w) + "</li>"));
                out.println("</ul>");
            }
        }
        out.println("<h2>Models used</h2><ul>");
        java.util.Set<String> notes = new java.util.LinkedHashSet<>();
        for (Entry e : entries) {
            notes.addAll(ModelNotes.forType(e.design().geometry().type(), e.design().geometry().isPair()));
        }
        for (String note : notes) {
            out.println("<li>" + escape(note) + "</li>");
        }
        out.println("</ul><p class=\"small\">Touchstone files: S-parameters of the line alone, reference "
                + escape(Units.engineering(referenceOhm, "ohm", 4)) + " at both ports, on each design's sweep grid.</p>");
        out.println("<h2>Cautions</h2><div class=\"caution\">");
        ModelNotes.CAUTIONS.forEach(c -> out.println("<p>" + escape(c) + "</p>"));
        out.println("</div><h2>Files</h2><ul>");
        for (Path file : files.values()) {
            String name = escape(file.getFileName().toString());
            out.println("<li><a href=\"" + name + "\">" + name + "</a></li>");
        }
        out.println("</ul></body></html>");
        out.flush();
    }

    /** Key values of the live design at the decades of its sweep. */
    private static void writeKeyValues(PrintWriter out, Entry live) {
        Design design = live.design();
        LineModel model = design.toModel();
        List<Double> frequencies = new ArrayList<>();
        double from = design.sweep().fromHz();
        double to = design.sweep().toHz();
        for (double f = Math.pow(10, Math.ceil(Math.log10(from))); f <= to * (1 + 1e-12); f *= 10) {
            frequencies.add(f);
        }
        while (frequencies.size() > 8) {
            List<Double> thinned = new ArrayList<>();
            for (int i = 0; i < frequencies.size(); i += 2) {
                thinned.add(frequencies.get(i));
            }
            frequencies = thinned;
        }
        if (frequencies.isEmpty()) {
            frequencies.add(Math.sqrt(from * to));
        }
        out.println("<h2>Key values</h2><table><tr><th></th>");
        frequencies.forEach(f -> out.print("<th>" + hz(f) + "</th>"));
        out.println("</tr>");
        List<LinePoint> points = frequencies.stream().map(model::at).toList();
        double length = design.lengthMetres();
        row(out, "|Z0| (Ω)", points, p -> String.format(Locale.ROOT, "%.4g", p.z0MagnitudeOhm()));
        row(out, "attenuation (dB/m)", points, p -> String.format(Locale.ROOT, "%.4g", p.alphaDbPerMetre()));
        row(out, "loss over the length (dB)", points, p -> String.format(Locale.ROOT, "%.4g", p.totalLossDb(length)));
        row(out, "phase velocity (fraction of c)", points, p -> String.format(Locale.ROOT, "%.4f",
                p.phaseVelocityMetresPerSecond() / PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND));
        row(out, "electrical length L/λ", points, p -> String.format(Locale.ROOT, "%.4g",
                p.electricalLengthWavelengths(length)));
        if (design.geometry().isPair()) {
            List<PairModes> modes = frequencies.stream().map(f -> design.toPair().modes(f)).toList();
            out.print("<tr><td>pair Zdiff / Zcommon (Ω)</td>");
            modes.forEach(m -> out.print(String.format(Locale.ROOT, "<td>%.4g / %.4g</td>",
                    m.differentialImpedanceOhm(), m.commonImpedanceOhm())));
            out.println("</tr>");
        }
        out.println("</table>");
    }

    private static void row(PrintWriter out, String name, List<LinePoint> points,
            java.util.function.Function<LinePoint, String> value) {
        out.print("<tr><td>" + escape(name) + "</td>");
        points.forEach(p -> out.print("<td>" + escape(value.apply(p)) + "</td>"));
        out.println("</tr>");
    }
}
