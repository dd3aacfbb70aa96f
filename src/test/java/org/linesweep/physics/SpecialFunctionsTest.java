package org.linesweep.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.linesweep.physics.Tolerances.relativeError;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SpecialFunctionsTest {

    private static Complex i0(Complex z) {
        return SpecialFunctions.scaledI(z)[0].multiply(z.exp());
    }

    private static Complex i1(Complex z) {
        return SpecialFunctions.scaledI(z)[1].multiply(z.exp());
    }

    /** Abramowitz and Stegun, Table 9.8 (x = 1, 2): I0, I1, K0, K1 of real argument. */
    @ParameterizedTest
    @CsvSource({
        "1.0, 1.266065878, 0.565159104, 0.4210244382, 0.6019072302",
        "2.0, 2.279585302, 1.590636855, 0.1138938727, 0.1398658818"
    })
    void modifiedBesselFunctionsMatchAbramowitzStegunTable98(double x, double i0, double i1, double k0, double k1) {
        Complex z = new Complex(x);
        Complex[] k = SpecialFunctions.scaledK(z);
        assertEquals(i0, i0(z).getReal(), 1e-9 * i0);
        assertEquals(i1, i1(z).getReal(), 1e-9 * i1);
        assertEquals(k0, k[0].multiply(Math.exp(-x)).getReal(), 1e-9 * k0);
        assertEquals(k1, k[1].multiply(Math.exp(-x)).getReal(), 1e-9 * k1);
    }

    /**
     * Kelvin functions: ber x + j·bei x = I0(x·e^(jπ/4)) (A&amp;S 9.9.1 with J0(iz) = I0(z)).
     * Values from A&amp;S Table 9.12 (from memory): ber 1 = 0.9843817812, bei 1 = 0.2495660400,
     * ber 2 = 0.7517341827, bei 2 = 0.9722916273.
     */
    @ParameterizedTest
    @CsvSource({"1.0, 0.9843817812, 0.2495660400", "2.0, 0.7517341827, 0.9722916273"})
    void kelvinFunctionsMatchAbramowitzStegunTable912(double x, double ber, double bei) {
        Complex value = i0(new Complex(x / Math.sqrt(2), x / Math.sqrt(2)));
        assertEquals(ber, value.getReal(), 2e-10);
        assertEquals(bei, value.getImaginary(), 2e-10);
    }

    /**
     * Bessel functions of the second kind, Y0 and Y1 of real argument, against mpmath 1.3.0 ({@code bessely},
     * 25 digits) across the series' range; J0 and J1 against Commons Math's {@code BesselJ}.
     */
    @ParameterizedTest
    @CsvSource({
        "1e-6, -8.8690314816594437, -636619.772372175014",
        "0.1, -1.53423865135036684, -6.45895109470202699",
        "1.0, 0.088256964215676958, -0.781212821300288717",
        "1.8, 0.477431714900475995, -0.223664868173500746",
        "2.0, 0.51037567264974512, -0.107032431540937547",
        "5.0, -0.30851762524903378, 0.147863143391226845",
        "8.0, 0.223521489387566221, -0.158060461731247494"
    })
    void besselFunctionsOfRealArgumentMatchReferenceLibraries(double x, double y0, double y1) {
        double[] jy = new double[4];
        SpecialFunctions.besselJY(x, jy);
        // the sums lose about three digits at x = 8 (terms grow to I0(8) = 428 against |J0(8)| = 0.17)
        double tolerance = x <= 2 ? 2e-15 : 1e-12;
        assertEquals(BesselJ.value(0, x), jy[0], tolerance * Math.max(1, Math.abs(jy[0])));
        assertEquals(BesselJ.value(1, x), jy[1], tolerance * Math.max(1, Math.abs(jy[1])));
        assertTrue(relativeError(jy[2], y0) < tolerance, "Y0(" + x + ") = " + jy[2]);
        assertTrue(relativeError(jy[3], y1) < tolerance, "Y1(" + x + ") = " + jy[3]);
    }

    /** Wronskian J1(x)Y0(x) − J0(x)Y1(x) = 2/(πx) (A&amp;S 9.1.16), an identity the series are not built on. */
    @ParameterizedTest
    @CsvSource({"1e-4", "0.3", "1.0", "1.84", "3.0", "6.0", "8.0"})
    void besselWronskianHolds(double x) {
        double[] jy = new double[4];
        SpecialFunctions.besselJY(x, jy);
        assertEquals(1.0, (jy[1] * jy[2] - jy[0] * jy[3]) * Math.PI * x / 2, 1e-12);
    }

    /** Outside the series' range the method refuses instead of returning digits it does not have. */
    @Test
    void besselSeriesRefusesArgumentsOutsideItsRange() {
        double[] jy = new double[4];
        for (double x : new double[] {0.0, -1.0, 8.5, Double.NaN}) {
            assertThrows(IllegalArgumentException.class, () -> SpecialFunctions.besselJY(x, jy), "x = " + x);
        }
    }

    /** Wronskian I0(z)K1(z) + I1(z)K0(z) = 1/z (A&amp;S 9.6.15), in every range of both methods. */
    @ParameterizedTest
    @CsvSource({"0.01", "0.5", "1.9", "2.1", "5", "12", "19.9", "20.1", "24.9", "25.1", "60", "400"})
    void wronskianHoldsOnTheConductorRay(double modulus) {
        Complex z = new Complex(modulus / Math.sqrt(2), modulus / Math.sqrt(2));
        Complex[] i = SpecialFunctions.scaledI(z);
        Complex[] k = SpecialFunctions.scaledK(z);
        Complex wronskian = i[0].multiply(k[1]).add(i[1].multiply(k[0])).multiply(z);
        assertEquals(1.0, wronskian.getReal(), 1e-12);
        assertEquals(0.0, wronskian.getImaginary(), 1e-12);
    }

    /** Both sides of every switch between methods agree (series against asymptotic or quadrature). */
    @Test
    void methodsAgreeAtTheirSwitchPoints() {
        double[] switches = {SpecialFunctions.K_SERIES_LIMIT, SpecialFunctions.K_ASYMPTOTIC_LIMIT};
        for (double modulus : switches) {
            Complex z = new Complex(modulus / Math.sqrt(2), modulus / Math.sqrt(2));
            Complex[] series = SpecialFunctions.seriesK(z);
            Complex[] quadrature = SpecialFunctions.continuedFractionScaledK(z);
            Complex[] asymptotic = SpecialFunctions.asymptoticScaledK(z);
            for (int n = 0; n < 2; n++) {
                Complex scaledSeries = series[n].multiply(z.exp());
                if (modulus == SpecialFunctions.K_SERIES_LIMIT) {
                    assertTrue(quadrature[n].subtract(scaledSeries).abs() < 1e-12 * quadrature[n].abs());
                } else {
                    assertTrue(quadrature[n].subtract(asymptotic[n]).abs() < 1e-12 * quadrature[n].abs());
                }
            }
        }
        Complex z = new Complex(SpecialFunctions.I_SERIES_LIMIT / Math.sqrt(2),
                SpecialFunctions.I_SERIES_LIMIT / Math.sqrt(2));
        Complex[] series = SpecialFunctions.seriesI(z);
        Complex[] asymptotic = SpecialFunctions.asymptoticScaledI(z);
        for (int n = 0; n < 2; n++) {
            Complex scaled = series[n].multiply(z.negate().exp());
            assertTrue(scaled.subtract(asymptotic[n]).abs() < 1e-11 * asymptotic[n].abs(),
                    "I" + n + " series " + scaled + " vs asymptotic " + asymptotic[n]);
        }
    }

    /** Two independent methods for K_n in the middle range agree: Steed's continued fraction and the integral. */
    @ParameterizedTest
    @CsvSource({"2.0", "3.7", "8", "14", "19.99"})
    void continuedFractionAgreesWithTheIntegral(double modulus) {
        for (double angle : new double[] {0.0, Math.PI / 8, Math.PI / 4, 0.4 * Math.PI}) {
            Complex z = new Complex(modulus * Math.cos(angle), modulus * Math.sin(angle));
            Complex[] steed = SpecialFunctions.continuedFractionScaledK(z);
            Complex[] integral = SpecialFunctions.quadratureScaledK(z);
            for (int n = 0; n < 2; n++) {
                assertTrue(steed[n].subtract(integral[n]).abs() < 1e-13 * integral[n].abs(),
                        "K" + n + "(" + z + "): " + steed[n] + " vs " + integral[n]);
            }
        }
    }

    /** Complete elliptic integral K(k), A&amp;S Table 17.1 by parameter m = k²: K(0) = π/2, m = 0.5, 0.9. */
    @ParameterizedTest
    @CsvSource({"0.0, 1.5707963268", "0.5, 1.8540746773", "0.9, 2.5780921134", "0.99, 3.6956373629"})
    void ellipticIntegralMatchesAbramowitzStegunTable171(double parameter, double expected) {
        assertTrue(relativeError(SpecialFunctions.ellipticK(Math.sqrt(parameter)), expected)
                < Tolerances.TABLE_10_DIGITS);
    }
}
