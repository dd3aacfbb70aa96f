package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.function.DoubleFunction;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * What a sweep point reads for each conductor (tables on ln f, precomputed constants) against the exact
 * internal-impedance forms of {@link InternalImpedance} (Schelkunoff 1934; the plane conductor of Ramo, Whinnery
 * and Van Duzer), with Hammerstad's roughness factor: the value within 1e-9 and dZ/dω within 1e-6 of a central
 * difference of the exact form, both relative to |Z| (the slope on its natural scale |Z|/ω), for sizes from
 * 10 µm to 10 mm, roughness up to 3 µm and frequencies from 1 Hz to 100 GHz.
 */
class SkinEffectTermTest {

    static final double VALUE_TOLERANCE = 1e-9;
    static final double SLOPE_TOLERANCE = 1e-6;

    private interface Exact {
        Complex at(Conductor conductor, double sizeMetres, double frequencyHz);
    }

    private interface Term {
        SkinEffectTerm of(Conductor conductor, double sizeMetres);
    }

    private static void check(String what, Term term, Exact exact) {
        SplittableRandom random = new SplittableRandom(what.hashCode());
        double worstValue = 0;
        double worstSlope = 0;
        for (int i = 0; i < 4000; i++) {
            double size = Math.exp(Math.log(10e-6) + random.nextDouble() * Math.log(1000));
            double roughness = random.nextBoolean() ? 0 : random.nextDouble() * 3e-6;
            Conductor conductor = new Conductor(5.8e7 * (0.05 + random.nextDouble()), 0.00393, 1, roughness, 293.15);
            double f = Math.exp(random.nextDouble() * Math.log(1e11));
            SkinEffectTerm under = term.of(conductor, size);
            LineModel line = new ParallelPlateLine(0.01, 0.001, 35e-6, conductor, Dielectric.lossless(1));
            LineParameters p = new LineParameters();
            p.setFrequency(f);
            line.beginPoint(p);
            under.addTo(p);
            Complex reference = exact.at(conductor, size, f);
            double h = 1e-5 * f;
            Complex slope = exact.at(conductor, size, f + h).subtract(exact.at(conductor, size, f - h))
                    .divide(2 * Math.PI * 2 * h);
            double scale = reference.abs();
            worstValue = Math.max(worstValue,
                    new Complex(p.impedanceRe, p.impedanceIm).subtract(reference).abs() / scale);
            worstSlope = Math.max(worstSlope,
                    new Complex(p.impedanceReSlope, p.impedanceImSlope).subtract(slope).abs() * p.omega / scale);
        }
        assertTrue(worstValue < VALUE_TOLERANCE, what + " value " + worstValue);
        assertTrue(worstSlope < SLOPE_TOLERANCE, what + " slope " + worstSlope);
    }

    @Test
    void roundWire() {
        check("round wire", (c, a) -> SkinEffectTerm.roundWire(c, a, 1.0, 1.0), InternalImpedance::roundWire);
    }

    @Test
    void roundWireWithProximity() {
        double proximity = 1.3;
        check("round wire with proximity", (c, a) -> SkinEffectTerm.roundWire(c, a, proximity, 1.0), (c, a, f) -> {
            Complex wire = InternalImpedance.roundWire(c, a, f);
            double dc = 1.0 / (c.conductivitySiemensPerMetre() * Math.PI * a * a);
            Complex ratio = wire.divide(dc * c.roughnessFactor(f));
            return wire.multiply(InternalImpedance.blendedProximity(ratio, proximity));
        });
    }

    @Test
    void flatConductor() {
        check("flat", (c, t) -> SkinEffectTerm.flat(c, t, 1.0), InternalImpedance::flatSurface);
    }

    @Test
    void thickFlatConductor() {
        check("thick flat", (c, t) -> SkinEffectTerm.flat(c, Double.POSITIVE_INFINITY, 1.0),
                (c, t, f) -> InternalImpedance.flatSurface(c, Double.POSITIVE_INFINITY, f));
    }

    /** Tubes with walls from 2 % to 3× the inner radius, read from the thick-wall table or computed exactly. */
    @Test
    void tube() {
        for (double kappa : new double[] {1.02, 1.17, 1.5, 4.0}) {
            check("tube c/b " + kappa, (c, b) -> SkinEffectTerm.tube(c, b, kappa * b),
                    (c, b, f) -> InternalImpedance.tube(c, b, kappa * b, f));
        }
    }

    /** A tube with its own sweep table over the thin-wall range, as a dense coax sweep builds it. */
    @Test
    void tubeWithSweepTable() {
        Conductor copper = new Conductor(5.8e7, 0.00393, 1, 0, 293.15);
        double b = 1.5e-3;
        double kappa = 1.17;
        SkinEffectTerm term = SkinEffectTerm.tube(copper, b, kappa * b);
        double[] frequencies = new double[20_000];
        for (int i = 0; i < frequencies.length; i++) {
            frequencies[i] = Math.exp(Math.log(10) + i * Math.log(1e9) / (frequencies.length - 1));
        }
        term.prepareForSweep(frequencies, frequencies.length);
        DoubleFunction<Complex> exact = f -> InternalImpedance.tube(copper, b, kappa * b, f);
        double worst = 0;
        SplittableRandom random = new SplittableRandom(3);
        LineModel line = new ParallelPlateLine(0.01, 0.001, 35e-6, copper, Dielectric.lossless(1));
        for (int i = 0; i < 5000; i++) {
            double f = Math.exp(Math.log(10) + random.nextDouble() * Math.log(1e9));
            LineParameters p = new LineParameters();
            p.setFrequency(f);
            line.beginPoint(p);
            term.addTo(p);
            worst = Math.max(worst, new Complex(p.impedanceRe, p.impedanceIm).subtract(exact.apply(f)).abs()
                    / exact.apply(f).abs());
        }
        assertTrue(worst < VALUE_TOLERANCE, "value " + worst);
    }
}
