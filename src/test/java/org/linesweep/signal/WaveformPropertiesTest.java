package org.linesweep.signal;

import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.linesweep.design.Design;
import org.linesweep.io.Presets;

/**
 * Any stimulus on any preset: the waveform computes without error, every sample is finite, and the settled
 * value is the DC divider's, between 0 and the source's 1 V (a passive network driven through a resistance).
 */
class WaveformPropertiesTest {

    @Property(tries = 60, seed = "20261208")
    void anyStimulusOnAnyPresetGivesAFiniteWaveform(
            @ForAll @IntRange(min = 0, max = 9) int preset,
            @ForAll @IntRange(min = 0, max = 2) int shapeIndex,
            @ForAll @DoubleRange(min = -12, max = -8) double logRise,
            @ForAll @DoubleRange(min = 0, max = 1000) double sourceOhm,
            @ForAll @DoubleRange(min = -1, max = 6) double logLoad,
            @ForAll @DoubleRange(min = 0, max = 50) double loadPicofarad) {
        Design design = Presets.load(Presets.NAMES.get(preset));
        double rise = Math.pow(10, logRise);
        WaveShape shape = WaveShape.values()[shapeIndex];
        double load = logLoad > 5.5 ? Double.POSITIVE_INFINITY : Math.pow(10, logLoad);
        WaveformSettings settings = new WaveformSettings(WaveShape.STEP, rise, Double.NaN, Double.NaN, sourceOhm,
                load, loadPicofarad * 1e-12, Double.NaN).withShape(shape);
        Waveform waveform = settings.simulate(design.toModel(), design.lengthMetres());
        assertTrue(waveform.size() > 10);
        for (int i = 0; i < waveform.size(); i++) {
            assertTrue(Double.isFinite(waveform.inputVolts()[i]) && Double.isFinite(waveform.outputVolts()[i])
                    && Double.isFinite(waveform.sourceVolts()[i]), "sample " + i);
        }
        assertTrue(waveform.settledVolts() >= -1e-9 && waveform.settledVolts() <= 1 + 1e-9,
                "settled " + waveform.settledVolts());
    }
}
