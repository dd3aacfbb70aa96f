package org.linesweep.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.complex.Complex;
import org.linesweep.design.InvalidInputException;
import org.linesweep.signal.ScatteringSweep;

/**
 * Two-port Touchstone files (version 1.1 of the open Touchstone format, extension {@code .s2p}).
 *
 * <p>We write {@code # HZ S RI R <ref>} with the four parameters in the order the format fixes for two
 * ports, S11 S21 S12 S22, one frequency per line, 12 significant digits. The reader takes what other tools
 * write as well: any of HZ/KHZ/MHZ/GHZ, the RI, MA and DB forms, the defaults of a missing option line
 * (GHZ, MA, 50 Ω), comments after '!', and values of one frequency spread over several lines.
 */
public final class Touchstone {

    /** A two-port's S-parameters as read from a file. */
    public record TwoPortData(double[] frequenciesHz, double referenceOhm, Complex[] s11, Complex[] s21,
            Complex[] s12, Complex[] s22) {

        /** Number of frequencies. */
        public int size() {
            return frequenciesHz.length;
        }
    }

    private Touchstone() {
    }

    /** The comment header of an exported line: what it is and how it was modelled. */
    public static List<String> header(org.linesweep.design.Design design, double referenceOhm) {
        return List.of("LineSweep two-port: " + (design.name().isEmpty() ? "unnamed design" : design.name()),
                "line: " + design.toModel(),
                "length: " + org.linesweep.design.Units.engineering(design.lengthMetres(), "m", 6),
                "reference impedance: " + referenceOhm + " ohm at both ports",
                "model: telegrapher's equations with the design's RLGC; TEM only (see the limits command)");
    }

    /**
     * Writes a sweep as a Touchstone 1.1 two-port.
     *
     * @param comments lines for the header (each is prefixed with "! ")
     */
    public static void write(ScatteringSweep sweep, List<String> comments, OutputStream stream) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(stream, StandardCharsets.US_ASCII));
        for (String comment : comments) {
            for (String line : comment.split("\n")) {
                out.print("! ");
                out.println(line.replaceAll("[^\\x20-\\x7E]", "?"));
            }
        }
        out.printf(Locale.ROOT, "# HZ S RI R %s%n", number(sweep.referenceOhm()));
        out.println("! freq_hz  re_s11 im_s11  re_s21 im_s21  re_s12 im_s12  re_s22 im_s22");
        for (int i = 0; i < sweep.size(); i++) {
            Complex s11 = sweep.s11()[i];
            Complex s21 = sweep.s21()[i];
            out.printf(Locale.ROOT, "%s %s %s %s %s %s %s %s %s%n", number(sweep.frequenciesHz()[i]),
                    number(s11.getReal()), number(s11.getImaginary()), number(s21.getReal()),
                    number(s21.getImaginary()), number(s21.getReal()), number(s21.getImaginary()),
                    number(s11.getReal()), number(s11.getImaginary()));
        }
        out.flush();
    }

    private static String number(double value) {
        return String.format(Locale.ROOT, "%.12g", value).replaceAll("(\\.\\d*?)0+(e|$)", "$1$2")
                .replace(".e", "e").replaceAll("\\.$", "");
    }

    /** Reads a two-port file; errors name the file's line. */
    public static TwoPortData read(Path file) throws IOException {
        try (BufferedReader reader = Files.newBufferedReader(file, StandardCharsets.ISO_8859_1)) {
            return read(reader, file.getFileName().toString());
        }
    }

    /** Reads a two-port from text. */
    public static TwoPortData read(String text) {
        try {
            return read(new BufferedReader(new StringReader(text)), "text");
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static TwoPortData read(Reader source, String name) throws IOException {
        BufferedReader reader = new BufferedReader(source);
        double unit = 1e9;
        String form = "MA";
        double reference = 50.0;
        boolean optionSeen = false;
        List<double[]> rows = new ArrayList<>();
        double[] pending = new double[9];
        int filled = 0;
        int lineNumber = 0;
        String line;
        while ((line = reader.readLine()) != null) {
            lineNumber++;
            int comment = line.indexOf('!');
            String content = (comment >= 0 ? line.substring(0, comment) : line).strip();
            if (content.isEmpty()) {
                continue;
            }
            if (content.startsWith("[")) {
                throw error(name, lineNumber, content, "a Touchstone 2 keyword; only version 1.1 files are read");
            }
            if (content.startsWith("#")) {
                if (optionSeen) {
                    continue; // the format says later option lines are ignored
                }
                optionSeen = true;
                String[] tokens = content.substring(1).strip().toUpperCase(Locale.ROOT).split("\\s+");
                for (int i = 0; i < tokens.length; i++) {
                    switch (tokens[i]) {
                        case "" -> { }
                        case "HZ" -> unit = 1.0;
                        case "KHZ" -> unit = 1e3;
                        case "MHZ" -> unit = 1e6;
                        case "GHZ" -> unit = 1e9;
                        case "S" -> { }
                        case "Y", "Z", "H", "G" -> throw error(name, lineNumber, content,
                                "only S-parameter files are read, not " + tokens[i]);
                        case "RI", "MA", "DB" -> form = tokens[i];
                        case "R" -> {
                            if (i + 1 >= tokens.length) {
                                throw error(name, lineNumber, content, "R must be followed by the reference impedance");
                            }
                            reference = parse(name, lineNumber, tokens[++i]);
                            if (!(reference > 0)) {
                                throw error(name, lineNumber, content, "the reference impedance must be positive");
                            }
                        }
                        default -> throw error(name, lineNumber, content, "unknown option '" + tokens[i] + "'");
                    }
                }
                continue;
            }
            for (String token : content.split("\\s+")) {
                double value = parse(name, lineNumber, token);
                if (filled == 0 && !rows.isEmpty() && value * unit <= rows.get(rows.size() - 1)[0]) {
                    // a frequency that does not increase starts a two-port's noise block, which we do not read
                    return build(rows, reference, form);
                }
                pending[filled++] = value;
                if (filled == 9) {
                    double[] row = pending.clone();
                    row[0] *= unit;
                    rows.add(row);
                    filled = 0;
                }
            }
        }
        if (filled != 0) {
            throw error(name, lineNumber, "", "the last frequency has " + filled + " values; a two-port needs 9");
        }
        if (rows.isEmpty()) {
            throw new InvalidInputException(name, null, "no data: a two-port Touchstone file needs at least one"
                    + " line of frequency and 8 values");
        }
        return build(rows, reference, form);
    }

    private static TwoPortData build(List<double[]> rows, double reference, String form) {
        int n = rows.size();
        double[] frequencies = new double[n];
        Complex[][] s = new Complex[4][n];
        for (int i = 0; i < n; i++) {
            double[] row = rows.get(i);
            frequencies[i] = row[0];
            for (int p = 0; p < 4; p++) {
                s[p][i] = complex(form, row[1 + 2 * p], row[2 + 2 * p]);
            }
        }
        return new TwoPortData(frequencies, reference, s[0], s[1], s[2], s[3]);
    }

    private static Complex complex(String form, double first, double second) {
        double radians = Math.toRadians(second);
        return switch (form) {
            case "RI" -> new Complex(first, second);
            case "MA" -> new Complex(first * Math.cos(radians), first * Math.sin(radians));
            default -> {
                double magnitude = Math.pow(10, first / 20);
                yield new Complex(magnitude * Math.cos(radians), magnitude * Math.sin(radians));
            }
        };
    }

    private static double parse(String name, int line, String token) {
        try {
            double value = Double.parseDouble(token);
            if (!Double.isFinite(value)) {
                throw new NumberFormatException();
            }
            return value;
        } catch (NumberFormatException e) {
            throw error(name, line, token, "not a number");
        }
    }

    private static InvalidInputException error(String name, int line, String content, String allowed) {
        return new InvalidInputException(name + " line " + line, content, allowed);
    }
}
