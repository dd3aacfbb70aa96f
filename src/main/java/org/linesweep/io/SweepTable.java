package org.linesweep.io;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.function.BiFunction;
import org.linesweep.sweep.SweepResult;

/**
 * The sweep as a table with fixed column names, written as CSV or JSON. One row per frequency, full double
 * precision; an empty CSV cell (JSON null) where a quantity does not apply, such as the skin depth of a
 * perfect conductor.
 */
public final class SweepTable {

    /** A column: its name and how to read it from a sweep. */
    public record Column(String name, BiFunction<SweepResult, Integer, Double> value) {
    }

    /** The columns, in order. */
    public static final List<Column> COLUMNS = List.of(
            new Column("frequency_hz", SweepResult::frequencyHz),
            new Column("r_ohm_per_m", SweepResult::resistanceOhmPerMetre),
            new Column("l_h_per_m", SweepResult::inductanceHenryPerMetre),
            new Column("g_s_per_m", SweepResult::conductanceSiemensPerMetre),
            new Column("c_f_per_m", SweepResult::capacitanceFaradPerMetre),
            new Column("z0_re_ohm", SweepResult::z0RealOhm),
            new Column("z0_im_ohm", SweepResult::z0ImaginaryOhm),
            new Column("alpha_db_per_m", SweepResult::alphaDbPerMetre),
            new Column("beta_rad_per_m", SweepResult::betaRadiansPerMetre),
            new Column("phase_velocity_m_per_s", SweepResult::phaseVelocityMetresPerSecond),
            new Column("group_velocity_m_per_s", SweepResult::groupVelocityMetresPerSecond),
            new Column("wavelength_m", SweepResult::wavelengthMetres),
            new Column("electrical_length", SweepResult::electricalLength),
            new Column("eps_eff", SweepResult::effectivePermittivity),
            new Column("skin_depth_m", SweepResult::skinDepthMetres));

    /** The columns an edge-coupled pair's sweep adds after {@link #COLUMNS}. */
    public static final List<Column> PAIR_COLUMNS = List.of(
            new Column("z_odd_ohm", SweepResult::oddImpedanceOhm),
            new Column("z_even_ohm", SweepResult::evenImpedanceOhm),
            new Column("z_diff_ohm", SweepResult::differentialImpedanceOhm),
            new Column("z_common_ohm", SweepResult::commonImpedanceOhm),
            new Column("eps_eff_odd", SweepResult::oddEffectivePermittivity),
            new Column("eps_eff_even", SweepResult::evenEffectivePermittivity));

    private SweepTable() {
    }

    /** The columns of a sweep: the line's, and a pair's after them. */
    public static List<Column> columns(SweepResult sweep) {
        if (!sweep.isPair()) {
            return COLUMNS;
        }
        List<Column> all = new java.util.ArrayList<>(COLUMNS);
        all.addAll(PAIR_COLUMNS);
        return List.copyOf(all);
    }

    /** The CSV header line of a single line's sweep, without a line break. */
    public static String csvHeader() {
        return String.join(",", COLUMNS.stream().map(Column::name).toList());
    }

    /** The CSV header line of this sweep, without a line break. */
    public static String csvHeader(SweepResult sweep) {
        return String.join(",", columns(sweep).stream().map(Column::name).toList());
    }

    /** Writes the sweep as CSV (header, then one line per frequency, "\n" line ends). */
    public static void writeCsv(SweepResult sweep, OutputStream stream) throws IOException {
        Writer out = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
        List<Column> columns = columns(sweep);
        out.write(csvHeader(sweep));
        out.write('\n');
        StringBuilder row = new StringBuilder(512);
        for (int i = 0; i < sweep.size(); i++) {
            row.setLength(0);
            for (int c = 0; c < columns.size(); c++) {
                if (c > 0) {
                    row.append(',');
                }
                double value = columns.get(c).value().apply(sweep, i);
                if (Double.isFinite(value)) {
                    row.append(value);
                }
            }
            row.append('\n');
            out.write(row.toString());
        }
        out.flush();
    }

    /** Writes the sweep as JSON: {"columns": [...], "rows": [[...], ...]}, null for an empty cell. */
    public static void writeJson(SweepResult sweep, OutputStream stream) throws IOException {
        try (JsonGenerator json = DesignFiles.mapper().getFactory().createGenerator(stream, JsonEncoding.UTF8)) {
            json.configure(JsonGenerator.Feature.AUTO_CLOSE_TARGET, false);
            json.writeStartObject();
            List<Column> columns = columns(sweep);
            json.writeArrayFieldStart("columns");
            for (Column column : columns) {
                json.writeString(column.name());
            }
            json.writeEndArray();
            json.writeArrayFieldStart("rows");
            for (int i = 0; i < sweep.size(); i++) {
                json.writeStartArray();
                for (Column column : columns) {
                    double value = column.value().apply(sweep, i);
                    if (Double.isFinite(value)) {
                        json.writeNumber(value);
                    } else {
                        json.writeNull();
                    }
                }
                json.writeEndArray();
            }
            json.writeEndArray();
            json.writeEndObject();
            json.writeRaw('\n');
        }
    }
}
