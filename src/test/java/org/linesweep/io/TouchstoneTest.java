package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.physics.CoaxLine;
import org.linesweep.physics.Conductor;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.Dielectric;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.PhysicalConstants;
import org.linesweep.signal.ScatteringSweep;

/** The line as a two-port: network identities and the Touchstone 1.1 round trip. */
class TouchstoneTest {

    private static final double ETA0 = PhysicalConstants.FREE_SPACE_IMPEDANCE_OHM;

    private static ScatteringSweep presetSweep(String preset, double reference) {
        Design design = Presets.load(preset);
        return ScatteringSweep.of(design.toModel(), design.lengthMetres(), design.sweep().grid().frequencies(),
                reference);
    }

    /**
     * A passive uniform line is reciprocal (S21 = S12) and symmetric (S11 = S22) by construction of the
     * file, and passive: |S11|² + |S21|² ≤ 1 (Pozar, Microwave Engineering, §4.3: a lossless network's S is
     * unitary, a lossy one's columns have norm below one).
     */
    @ParameterizedTest
    @ValueSource(strings = {"bench-patch-lead", "board-trace-50-ohm", "ladder-line-feeder", "buried-clock-stripline",
        "motor-drive-bus-bar", "sensor-harness-run"})
    void passiveAtEveryFrequency(String preset) {
        ScatteringSweep sweep = presetSweep(preset, 50);
        for (int i = 0; i < sweep.size(); i++) {
            double power = sweep.s11()[i].abs() * sweep.s11()[i].abs() + sweep.s21()[i].abs() * sweep.s21()[i].abs();
            assertTrue(power <= 1 + 1e-12, preset + " at " + sweep.frequenciesHz()[i] + " Hz: " + power);
        }
        TwoPortRoundTrip trip = roundTrip(sweep);
        for (int i = 0; i < sweep.size(); i++) {
            assertEquals(0, trip.data().s21()[i].subtract(trip.data().s12()[i]).abs(), 0, "reciprocity");
            assertEquals(0, trip.data().s11()[i].subtract(trip.data().s22()[i]).abs(), 0, "symmetry");
        }
    }

    /**
     * A lossless line matched to the reference gives S11 = 0 and S21 = exp(−jβL), β = 2πf·sqrt(εr)/c.
     */
    @Test
    void matchedLosslessLineIsAPhaseShift() {
        double ratio = 3.3483;
        LineModel coax = new CoaxLine(1e-3, ratio * 1e-3, 0.1e-3, Conductor.of(ConductorMaterial.PERFECT, 293.15),
                Dielectric.lossless(2.1));
        double z0 = ETA0 / (2 * Math.PI) * Math.log(ratio) / Math.sqrt(2.1);
        double length = 0.37;
        double[] frequencies = {1e6, 1e8, 1.234e9, 5e9};
        ScatteringSweep sweep = ScatteringSweep.of(coax, length, frequencies, z0);
        for (int i = 0; i < frequencies.length; i++) {
            double beta = 2 * Math.PI * frequencies[i] * Math.sqrt(2.1) / PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND;
            Complex expected = new Complex(0, -beta * length).exp();
            assertEquals(0, sweep.s11()[i].abs(), 1e-9);
            assertEquals(0, sweep.s21()[i].subtract(expected).abs(), 1e-9);
        }
    }

    /**
     * A lossless line of a quarter wavelength between 50 Ω ports with Z0 = 75 Ω: the input sees Z0²/50 =
     * 112.5 Ω, so |S11| = (112.5 − 50)/(112.5 + 50) = 0.3846 (the quarter-wave transformer, Pozar §2.5).
     */
    @Test
    void quarterWaveMismatch() {
        double ratio = Math.exp(75 * 2 * Math.PI / ETA0);
        LineModel coax = new CoaxLine(1e-3, ratio * 1e-3, 0.1e-3, Conductor.of(ConductorMaterial.PERFECT, 293.15),
                Dielectric.lossless(1.0));
        double frequency = 1e9;
        double quarter = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / frequency / 4;
        ScatteringSweep sweep = ScatteringSweep.of(coax, quarter, new double[] {frequency}, 50);
        assertEquals(62.5 / 162.5, sweep.s11()[0].abs(), 1e-9);
    }

    private record TwoPortRoundTrip(String text, Touchstone.TwoPortData data) {
    }

    private static TwoPortRoundTrip roundTrip(ScatteringSweep sweep) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        Touchstone.write(sweep, List.of("test line", "second\nand third"), buffer);
        String text = buffer.toString(StandardCharsets.US_ASCII);
        return new TwoPortRoundTrip(text, Touchstone.read(text));
    }

    /** What we write parses back with our reader to 12 significant digits, reference impedance included. */
    @Test
    void parsesBack() {
        ScatteringSweep sweep = presetSweep("board-trace-50-ohm", 42.5);
        TwoPortRoundTrip trip = roundTrip(sweep);
        assertTrue(trip.text().contains("# HZ S RI R 42.5"), trip.text().substring(0, 300));
        assertEquals(sweep.size(), trip.data().size());
        assertEquals(42.5, trip.data().referenceOhm());
        for (int i = 0; i < sweep.size(); i++) {
            assertEquals(sweep.frequenciesHz()[i], trip.data().frequenciesHz()[i], 1e-11 * sweep.frequenciesHz()[i]);
            assertEquals(0, sweep.s11()[i].subtract(trip.data().s11()[i]).abs(), 1e-11);
            assertEquals(0, sweep.s21()[i].subtract(trip.data().s21()[i]).abs(), 1e-11);
        }
    }

    /**
     * The reader takes the other forms of version 1.1: default option line (GHz, MA, 50 Ω), DB with angles
     * in degrees, values of one frequency over two lines, and stops at a two-port noise block.
     */
    @Test
    void readsOtherForms() {
        Touchstone.TwoPortData ma = Touchstone.read("! made by hand\n# \n1 0.5 90 0.8 -45 0.8 -45 0.5 90\n"
                + "2 0.25 180\n 0.7 0 0.7 0 0.25 180\n1.5 2.1 0.3 0.4 0.5\n");
        assertEquals(2, ma.size());
        assertEquals(1e9, ma.frequenciesHz()[0]);
        assertEquals(50.0, ma.referenceOhm());
        assertEquals(0, ma.s11()[0].subtract(new Complex(0, 0.5)).abs(), 1e-12);
        assertEquals(0, ma.s21()[0].subtract(new Complex(0.8 / Math.sqrt(2), -0.8 / Math.sqrt(2))).abs(), 1e-12);
        assertEquals(0, ma.s22()[1].subtract(new Complex(-0.25, 0)).abs(), 1e-12);
        Touchstone.TwoPortData db = Touchstone.read("# MHz S DB R 75\n100 -20 0 -1 90 -1 90 -20 0\n");
        assertEquals(1e8, db.frequenciesHz()[0]);
        assertEquals(75.0, db.referenceOhm());
        assertEquals(0.1, db.s11()[0].abs(), 1e-12);
        assertEquals(Math.pow(10, -1 / 20.0), db.s21()[0].getImaginary(), 1e-12);
    }

    @Test
    void badFilesNameTheLine() {
        InvalidInputException notNumber = assertThrows(InvalidInputException.class,
                () -> Touchstone.read("# HZ S RI R 50\n1e9 0 0 1 x 1 0 0 0\n"));
        assertTrue(notNumber.getMessage().contains("line 2"), notNumber.getMessage());
        InvalidInputException admittance = assertThrows(InvalidInputException.class,
                () -> Touchstone.read("# HZ Y RI R 50\n"));
        assertTrue(admittance.getMessage().contains("only S-parameter"), admittance.getMessage());
        InvalidInputException short8 = assertThrows(InvalidInputException.class,
                () -> Touchstone.read("# HZ S RI R 50\n1e9 0 0 1 0 1 0 0\n"));
        assertTrue(short8.getMessage().contains("needs 9"), short8.getMessage());
    }
}
