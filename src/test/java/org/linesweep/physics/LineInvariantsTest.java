package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.commons.math3.complex.Complex;

/**
 * Identities and sanity bounds every line must satisfy, as seeded property tests over random valid designs
 * and frequencies from 1 Hz to 1 THz:
 * <ul>
 *   <li>γ·Z0 = R' + jωL' and γ/Z0 = G' + jωC' (telegrapher's equations);</li>
 *   <li>α ≥ 0, Re Z0 &gt; 0 (passivity; principal roots);</li>
 *   <li>homogeneous TEM: L'_ext·C' = μ0μr·ε0ε′ and G'/C' = (ωε0ε″ + σ_d)/(ε0ε′) (facts of the trade);</li>
 *   <li>homogeneous TEM: v_p ≤ c/sqrt(ε′μr), because β ≥ ω·sqrt(L'C') for any passive R', G' and
 *       L' ≥ L'_ext;</li>
 *   <li>no NaN or infinity anywhere.</li>
 * </ul>
 */
class LineInvariantsTest {

    /** Relative tolerance of the identities: a few hundred roundings in the Bessel and square-root steps. */
    private static final double IDENTITY = 1e-9;

    @Provide
    Arbitrary<LineModel> lines() {
        Arbitrary<Conductor> conductors = Combinators.combine(
                Arbitraries.doubles().between(5, 7.8).ofScale(8).map(x -> Math.pow(10, x)),
                Arbitraries.of(1.0, 1.02, 100.0, 1000.0),
                Arbitraries.doubles().between(0, 5e-6).ofScale(8),
                Arbitraries.doubles().between(223, 473).ofScale(8)).as((sigma, mu, rough, kelvin) ->
                        new Conductor(sigma, 0.0039, mu, rough, kelvin));
        Arbitrary<Dielectric> dielectrics = Combinators.combine(
                Arbitraries.doubles().between(1, 100).ofScale(8),
                Arbitraries.doubles().between(0, 0.05).ofScale(8),
                Arbitraries.doubles().between(0, 1e-3).ofScale(8),
                Arbitraries.of(DielectricModelKind.values())).as((er, tan, sigma, kind) ->
                        new Dielectric(er, tan, 1e9, sigma, 1.0, kind, 1e3, 1e12));
        Arbitrary<Double> size = Arbitraries.doubles().between(-5, -1.30103).ofScale(8).map(x -> Math.pow(10, x));
        Arbitrary<Double> ratio = Arbitraries.doubles().between(0.00043, 4).ofScale(8).map(x -> Math.pow(10, x));
        return Combinators.combine(Arbitraries.integers().between(0, 5), size, ratio, conductors, dielectrics)
                .as((type, d, r, conductor, dielectric) -> switch (type) {
                    case 0 -> new CoaxLine(d, d * r, d * 0.2, conductor, dielectric);
                    case 1 -> new TwoWireLine(d, d * r, conductor, dielectric);
                    case 2 -> new WireOverGroundLine(d, d * r / 2, conductor, dielectric);
                    case 3 -> new ParallelPlateLine(d * r, d, d * 0.1, conductor, dielectric);
                    case 4 -> new MicrostripLine(d, d * Math.min(r, 50) / 10, d * 0.05, conductor,
                            new Dielectric(Math.min(dielectric.relativePermittivity(), 20), dielectric.lossTangent(),
                                    1e9, dielectric.conductivitySiemensPerMetre(), 1.0, dielectric.model(), 1e3, 1e12));
                    default -> new StriplineLine(d, d * Math.min(r, 50), d * 0.05, conductor, dielectric);
                });
    }

    @Provide
    Arbitrary<Double> frequencies() {
        return Arbitraries.doubles().between(0, 12).ofScale(8).map(x -> Math.pow(10, x));
    }

    @Property(tries = 400, seed = "20261201")
    void identitiesAndPassivity(@ForAll("lines") LineModel line, @ForAll("frequencies") double frequencyHz) {
        LinePoint p = line.at(frequencyHz);
        double omega = 2 * Math.PI * frequencyHz;
        List<Double> all = List.of(p.resistanceOhmPerMetre(), p.inductanceHenryPerMetre(),
                p.conductanceSiemensPerMetre(), p.capacitanceFaradPerMetre(), p.z0RealOhm(), p.z0ImaginaryOhm(),
                p.alphaNepersPerMetre(), p.betaRadiansPerMetre(), p.groupVelocityMetresPerSecond(),
                p.effectivePermittivity(), p.phaseVelocityMetresPerSecond(), p.wavelengthMetres());
        for (double value : all) {
            assertTrue(Double.isFinite(value), "non-finite output in " + p);
        }
        assertTrue(p.alphaNepersPerMetre() >= 0, "α < 0: " + p);
        assertTrue(p.z0RealOhm() > 0, "Re Z0 ≤ 0: " + p);
        Complex gamma = new Complex(p.alphaNepersPerMetre(), p.betaRadiansPerMetre());
        Complex z0 = new Complex(p.z0RealOhm(), p.z0ImaginaryOhm());
        Complex series = new Complex(p.resistanceOhmPerMetre(), omega * p.inductanceHenryPerMetre());
        Complex shunt = new Complex(p.conductanceSiemensPerMetre(), omega * p.capacitanceFaradPerMetre());
        assertTrue(gamma.multiply(z0).subtract(series).abs() <= IDENTITY * series.abs(), "γZ0 ≠ Z' " + p);
        assertTrue(gamma.divide(z0).subtract(shunt).abs() <= IDENTITY * shunt.abs(), "γ/Z0 ≠ Y' " + p);
    }

    @Property(tries = 300, seed = "20261202")
    void homogeneousTemIdentities(@ForAll("lines") LineModel line, @ForAll("frequencies") double frequencyHz) {
        if (!(line instanceof HomogeneousTemLine tem)) {
            return;
        }
        LinePoint p = line.at(frequencyHz);
        Dielectric.Evaluator eps = line.dielectric().evaluator();
        double eps0 = PhysicalConstants.VACUUM_PERMITTIVITY_FARAD_PER_METRE;
        double mu = PhysicalConstants.VACUUM_PERMEABILITY_HENRY_PER_METRE * line.dielectric().relativePermeability();
        double omega = 2 * Math.PI * frequencyHz;
        double internalInductance = tem.conductorImpedance(frequencyHz).getImaginary() / omega;
        double externalInductance = p.inductanceHenryPerMetre() - internalInductance;
        double product = externalInductance * p.capacitanceFaradPerMetre();
        double expected = mu * eps0 * eps.real(frequencyHz);
        // the subtraction loses the digits by which the internal inductance exceeds the external one (a thick
        // plane at 1 Hz with μr = 1000 can be 1e7 times larger): allow rounding at 1e-14 of the larger term
        double rounding = 1e-14 * Math.abs(internalInductance) * p.capacitanceFaradPerMetre();
        assertTrue(Math.abs(product - expected) <= 1e-8 * expected + rounding,
                "L'ext·C' ≠ με′: " + product + " vs " + expected + " " + line + " f=" + frequencyHz);
        double lossRatio = (omega * eps0 * eps.imaginary(frequencyHz) + line.dielectric().conductivitySiemensPerMetre())
                / (eps0 * eps.real(frequencyHz));
        double actual = p.conductanceSiemensPerMetre() / p.capacitanceFaradPerMetre();
        assertTrue(Math.abs(actual - lossRatio) <= 1e-12 * Math.max(lossRatio, 1e-300),
                "G'/C' mismatch " + actual + " vs " + lossRatio);
        double bound = PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND
                / Math.sqrt(eps.real(frequencyHz) * line.dielectric().relativePermeability());
        assertTrue(p.phaseVelocityMetresPerSecond() <= bound * (1 + 1e-12), "v_p above c/sqrt(εμ): " + p);
    }

    /** R' of a solid round wire never falls as f rises (skin effect only crowds the current). */
    @Property(tries = 100, seed = "20261203")
    void wireResistanceRisesWithFrequency(@ForAll("frequencies") double frequencyHz) {
        Conductor copper = Conductor.of(ConductorMaterial.COPPER, 293.15);
        double lower = InternalImpedance.roundWire(copper, 0.5e-3, frequencyHz).getReal();
        double higher = InternalImpedance.roundWire(copper, 0.5e-3, frequencyHz * 1.01).getReal();
        assertTrue(higher >= lower * (1 - 1e-13));
    }

    /** Coax Z0 rises with b/a. */
    @Property(tries = 100, seed = "20261204")
    void coaxImpedanceRisesWithRadiusRatio(@ForAll("frequencies") double frequencyHz) {
        Conductor copper = Conductor.of(ConductorMaterial.COPPER, 293.15);
        Dielectric ptfe = Dielectric.of(DielectricMaterial.PTFE);
        double previous = 0;
        for (double ratio = 1.01; ratio < 1e4; ratio *= 3) {
            double z = new CoaxLine(1e-3, ratio * 1e-3, 0.2e-3, copper, ptfe).at(frequencyHz).z0MagnitudeOhm();
            assertTrue(z > previous);
            previous = z;
        }
    }
}
