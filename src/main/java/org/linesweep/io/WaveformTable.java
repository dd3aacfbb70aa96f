package org.linesweep.io;

import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import org.linesweep.signal.Waveform;

/** A time-domain response as CSV with the exact header {@code time_s,input_v,output_v}. */
public final class WaveformTable {

    /** The header line. */
    public static final String HEADER = "time_s,input_v,output_v";

    private WaveformTable() {
    }

    /** Writes one row per sample: time, near-end voltage, far-end voltage. */
    public static void writeCsv(Waveform waveform, OutputStream stream) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8));
        out.println(HEADER);
        for (int i = 0; i < waveform.size(); i++) {
            out.printf(Locale.ROOT, "%.9e,%.9e,%.9e%n", waveform.timeSeconds()[i], waveform.inputVolts()[i],
                    waveform.outputVolts()[i]);
        }
        out.flush();
    }
}
