package org.linesweep.physics;

import org.apache.commons.math3.complex.Complex;

/**
 * Special functions that Commons Math 3.6.1 does not provide: modified Bessel functions of complex
 * argument (orders 0 and 1, exponentially scaled), Bessel functions of the second kind (orders 0 and 1, real
 * argument) and the complete elliptic integral of the first kind.
 *
 * <p>The Bessel functions are needed for the internal impedance of round conductors, whose argument
 * z = (1 + j)·r/δ always lies on the ray arg z = π/4; the methods are accurate (close to 1e-14
 * relative) for 0 &lt; |z| and |arg z| ≤ π/4, and usable but less accurate up to |arg z| &lt; π/2.
 * They are returned exponentially scaled, so they neither overflow nor underflow for |z| up to 1e300:
 * {@code scaledI} gives e^(−z)·I_n(z) and {@code scaledK} gives e^(+z)·K_n(z).
 *
 * <p>Methods, by range of |z|:
 * <ul>
 *   <li>I_n: ascending series (Abramowitz and Stegun 9.6.10) below |z| = 25, Hankel's asymptotic
 *       expansion (A&amp;S 9.7.1) above. At the switch the series loses about three digits to
 *       cancellation and the asymptotic form neglects a term of relative size |e^(−2z)| ≈ 4e-16.</li>
 *   <li>K_n: ascending series (A&amp;S 9.6.13 and 9.6.11) below |z| = 2; Steed's continued fraction
 *       (Temme's CF2, as in Press et al., Numerical Recipes, §6.7, which I. J. Thompson and A. R. Barnett,
 *       J. Comput. Phys. 64, 1986, showed to hold for complex z with Re z &gt; 0) for 2 ≤ |z| &lt; 20;
 *       Hankel's expansion (A&amp;S 9.7.2) above, whose smallest term there is about e^(−40). The integral
 *       K_n(z) = ∫₀^∞ exp(−z·cosh t)·cosh(n t) dt (A&amp;S 9.6.24), by the trapezoidal rule, is kept as an
 *       independent check in the tests.</li>
 * </ul>
 */
public final class SpecialFunctions {

    /** Euler-Mascheroni constant γ. */
    private static final double EULER_GAMMA = 0.5772156649015329;
    /** |z| below which the ascending series is used for I_n. */
    static final double I_SERIES_LIMIT = 25.0;
    /** |z| below which the ascending series is used for K_n. */
    static final double K_SERIES_LIMIT = 2.0;
    /** |z| from which Hankel's asymptotic expansion is used for K_n. */
    static final double K_ASYMPTOTIC_LIMIT = 20.0;
    /** Relative size of a term at which a series is considered converged. */
    private static final double SERIES_TOLERANCE = 1e-17;
    private static final int MAX_TERMS = 500;

    private SpecialFunctions() {
    }

    /**
     * Exponentially scaled modified Bessel functions of the first kind.
     *
     * @param z argument, z ≠ 0 with Re z ≥ 0
     * @return {e^(−z)·I0(z), e^(−z)·I1(z)}
     */
    public static Complex[] scaledI(Complex z) {
        double modulus = z.abs();
        if (modulus < I_SERIES_LIMIT) {
            Complex[] plain = seriesI(z);
            Complex scale = z.negate().exp();
            return new Complex[] {plain[0].multiply(scale), plain[1].multiply(scale)};
        }
        return asymptoticScaledI(z);
    }

    /**
     * Exponentially scaled modified Bessel functions of the second kind.
     *
     * @param z argument, z ≠ 0 with Re z &gt; 0
     * @return {e^(z)·K0(z), e^(z)·K1(z)}
     */
    public static Complex[] scaledK(Complex z) {
        double modulus = z.abs();
        if (modulus < K_SERIES_LIMIT) {
            Complex[] plain = seriesK(z);
            Complex scale = z.exp();
            return new Complex[] {plain[0].multiply(scale), plain[1].multiply(scale)};
        }
        if (modulus < K_ASYMPTOTIC_LIMIT) {
            return continuedFractionScaledK(z);
        }
        return asymptoticScaledK(z);
    }

    /**
     * The ratio I0(z)/I1(z), without overflow for any |z|.
     *
     * @param z argument, z ≠ 0 with Re z ≥ 0
     * @return I0(z)/I1(z)
     */
    public static Complex besselIRatio(Complex z) {
        if (z.abs() < I_SERIES_LIMIT) {
            Complex[] plain = seriesI(z);
            return plain[0].divide(plain[1]);
        }
        // the prefactor 1/sqrt(2πz) cancels in the ratio
        double[] sums = new double[4];
        hankelSums(z.getReal(), z.getImaginary(), true, sums);
        return new Complex(sums[0], sums[1]).divide(new Complex(sums[2], sums[3]));
    }

    /** Ascending series for I0 and I1 (A&amp;S 9.6.10), unscaled. */
    static Complex[] seriesI(Complex z) {
        double quarterSquareRe = 0.25 * (z.getReal() * z.getReal() - z.getImaginary() * z.getImaginary());
        double quarterSquareIm = 0.5 * z.getReal() * z.getImaginary();
        double term0Re = 1.0;
        double term0Im = 0.0;
        double term1Re = 1.0;
        double term1Im = 0.0;
        double sum0Re = 1.0;
        double sum0Im = 0.0;
        double sum1Re = 1.0;
        double sum1Im = 0.0;
        // the terms grow until k passes |z|/2; hoisted, since the modulus is a hypot (tens of ns) per call
        double halfModulus = 0.5 * z.abs();
        for (int k = 1; k < MAX_TERMS; k++) {
            double re0 = term0Re * quarterSquareRe - term0Im * quarterSquareIm;
            double im0 = term0Re * quarterSquareIm + term0Im * quarterSquareRe;
            double divisor0 = (double) k * k;
            term0Re = re0 / divisor0;
            term0Im = im0 / divisor0;
            double re1 = term1Re * quarterSquareRe - term1Im * quarterSquareIm;
            double im1 = term1Re * quarterSquareIm + term1Im * quarterSquareRe;
            double divisor1 = (double) k * (k + 1);
            term1Re = re1 / divisor1;
            term1Im = im1 / divisor1;
            sum0Re += term0Re;
            sum0Im += term0Im;
            sum1Re += term1Re;
            sum1Im += term1Im;
            double termSize = Math.abs(term0Re) + Math.abs(term0Im);
            double sumSize = Math.abs(sum0Re) + Math.abs(sum0Im);
            if (termSize <= SERIES_TOLERANCE * sumSize && k > halfModulus) {
                break;
            }
        }
        Complex halfZ = z.multiply(0.5);
        return new Complex[] {new Complex(sum0Re, sum0Im), halfZ.multiply(new Complex(sum1Re, sum1Im))};
    }

    /** Ascending series for K0 and K1 (A&amp;S 9.6.13, 9.6.11 with ψ(k+1) = −γ + H_k), unscaled. */
    static Complex[] seriesK(Complex z) {
        Complex quarterSquare = z.multiply(z).multiply(0.25);
        Complex logTerm = z.multiply(0.5).log().add(EULER_GAMMA);
        Complex term0 = Complex.ONE;
        Complex term1 = Complex.ONE;
        Complex sumI0 = Complex.ONE;
        Complex sumI1 = Complex.ONE;
        Complex harmonicSum0 = Complex.ZERO;
        Complex harmonicSum1 = term1.multiply(1.0); // H_0 + H_1 = 1 for k = 0
        double harmonic = 0.0;
        for (int k = 1; k < MAX_TERMS; k++) {
            term0 = term0.multiply(quarterSquare).divide((double) k * k);
            term1 = term1.multiply(quarterSquare).divide((double) k * (k + 1));
            double harmonicNext = harmonic + 1.0 / k;
            double harmonicAfter = harmonicNext + 1.0 / (k + 1);
            harmonic = harmonicNext;
            sumI0 = sumI0.add(term0);
            sumI1 = sumI1.add(term1);
            harmonicSum0 = harmonicSum0.add(term0.multiply(harmonicNext));
            harmonicSum1 = harmonicSum1.add(term1.multiply(harmonicNext + harmonicAfter));
            if (term0.abs() * (1.0 + harmonicAfter) <= SERIES_TOLERANCE * sumI0.abs() && k > 2) {
                break;
            }
        }
        Complex i0 = sumI0;
        Complex i1 = z.multiply(0.5).multiply(sumI1);
        Complex k0 = logTerm.negate().multiply(i0).add(harmonicSum0);
        Complex k1 = z.reciprocal().add(logTerm.multiply(i1)).subtract(z.multiply(0.25).multiply(harmonicSum1));
        return new Complex[] {k0, k1};
    }

    /** Hankel's expansion of e^(−z)·I_n(z), A&amp;S 9.7.1, for n = 0 and 1. */
    static Complex[] asymptoticScaledI(Complex z) {
        Complex prefactor = z.multiply(2.0 * Math.PI).sqrt().reciprocal();
        double[] sums = new double[4];
        hankelSums(z.getReal(), z.getImaginary(), true, sums);
        return new Complex[] {prefactor.multiply(new Complex(sums[0], sums[1])),
            prefactor.multiply(new Complex(sums[2], sums[3]))};
    }

    /** Hankel's expansion of e^(z)·K_n(z), A&amp;S 9.7.2, for n = 0 and 1. */
    static Complex[] asymptoticScaledK(Complex z) {
        Complex prefactor = z.multiply(2.0 / Math.PI).sqrt().reciprocal();
        double[] sums = new double[4];
        hankelSums(z.getReal(), z.getImaginary(), false, sums);
        return new Complex[] {prefactor.multiply(new Complex(sums[0], sums[1])),
            prefactor.multiply(new Complex(sums[2], sums[3]))};
    }

    /**
     * Σ (±1)^k a_k(ν)/z^k for ν = 0 and 1 at once, a_k = Π_{j≤k}(4ν² − (2j−1)²)/(k!·8^k), each stopped at its
     * smallest term (the series are asymptotic). Primitive arithmetic: this sits in the sweep's inner loop.
     *
     * @param out receives {Re S0, Im S0, Re S1, Im S1}
     */
    private static void hankelSums(double x, double y, boolean alternating, double[] out) {
        double inverse = 1.0 / (x * x + y * y);
        double invRe = x * inverse;
        double invIm = -y * inverse;
        double powerRe = 1.0;
        double powerIm = 0.0;
        double c0 = 1.0;
        double c1 = 1.0;
        double s0Re = 1.0;
        double s0Im = 0.0;
        double s1Re = 1.0;
        double s1Im = 0.0;
        double previous0 = Double.MAX_VALUE;
        double previous1 = Double.MAX_VALUE;
        boolean done0 = false;
        boolean done1 = false;
        for (int k = 1; k < MAX_TERMS && !(done0 && done1); k++) {
            double odd = 2.0 * k - 1.0;
            double sign = alternating && (k % 2 == 1) ? -1.0 : 1.0;
            double re = powerRe * invRe - powerIm * invIm;
            powerIm = powerRe * invIm + powerIm * invRe;
            powerRe = re;
            double modulus = Math.sqrt(powerRe * powerRe + powerIm * powerIm);
            if (!done0) {
                c0 *= (0.0 - odd * odd) / (8.0 * k);
                double size = Math.abs(c0) * modulus;
                if (size >= previous0) {
                    done0 = true;
                } else {
                    s0Re += sign * c0 * powerRe;
                    s0Im += sign * c0 * powerIm;
                    previous0 = size;
                    done0 = size <= SERIES_TOLERANCE * Math.hypot(s0Re, s0Im);
                }
            }
            if (!done1) {
                c1 *= (4.0 - odd * odd) / (8.0 * k);
                double size = Math.abs(c1) * modulus;
                if (size >= previous1 || c1 == 0.0) {
                    done1 = true;
                } else {
                    s1Re += sign * c1 * powerRe;
                    s1Im += sign * c1 * powerIm;
                    previous1 = size;
                    done1 = size <= SERIES_TOLERANCE * Math.hypot(s1Re, s1Im);
                }
            }
        }
        out[0] = s0Re;
        out[1] = s0Im;
        out[2] = s1Re;
        out[3] = s1Im;
    }

    /**
     * Steed's evaluation of Temme's continued fraction CF2 for e^(z)·K0(z) and e^(z)·K1(z), in primitive
     * complex arithmetic. Converges for Re z &gt; 0, in a few tens of steps once |z| ≥ 2.
     */
    static Complex[] continuedFractionScaledK(Complex z) {
        double x = z.getReal();
        double y = z.getImaginary();
        // b = 2(1 + z), d = 1/b, h = delh = d
        double bRe = 2.0 * (1.0 + x);
        double bIm = 2.0 * y;
        double inv = 1.0 / (bRe * bRe + bIm * bIm);
        double dRe = bRe * inv;
        double dIm = -bIm * inv;
        double hRe = dRe;
        double hIm = dIm;
        double delhRe = dRe;
        double delhIm = dIm;
        double q1 = 0.0;
        double q2 = 1.0;
        final double a1 = 0.25;
        double q = a1;
        double c = a1;
        double a = -a1;
        // q1, q2, q and c are real for order 0, so only the fraction and the sum are complex
        double sRe = 1.0 + q * delhRe;
        double sIm = q * delhIm;
        // the q recurrence runs on (q1 − b·q2)/a with complex b: keep q1, q2 complex
        double q1Re = q1;
        double q1Im = 0.0;
        double q2Re = q2;
        double q2Im = 0.0;
        double qRe = q;
        double qIm = 0.0;
        for (int i = 2; i < MAX_TERMS; i++) {
            a -= 2 * (i - 1);
            c = -a * c / i;
            double newRe = (q1Re - (bRe * q2Re - bIm * q2Im)) / a;
            double newIm = (q1Im - (bRe * q2Im + bIm * q2Re)) / a;
            q1Re = q2Re;
            q1Im = q2Im;
            q2Re = newRe;
            q2Im = newIm;
            qRe += c * newRe;
            qIm += c * newIm;
            bRe += 2.0;
            // d = 1/(b + a·d)
            double denRe = bRe + a * dRe;
            double denIm = bIm + a * dIm;
            double denInv = 1.0 / (denRe * denRe + denIm * denIm);
            dRe = denRe * denInv;
            dIm = -denIm * denInv;
            // delh = (b·d − 1)·delh
            double fRe = bRe * dRe - bIm * dIm - 1.0;
            double fIm = bRe * dIm + bIm * dRe;
            double nextRe = fRe * delhRe - fIm * delhIm;
            double nextIm = fRe * delhIm + fIm * delhRe;
            delhRe = nextRe;
            delhIm = nextIm;
            hRe += delhRe;
            hIm += delhIm;
            // dels = q·delh
            double delsRe = qRe * delhRe - qIm * delhIm;
            double delsIm = qRe * delhIm + qIm * delhRe;
            sRe += delsRe;
            sIm += delsIm;
            if (Math.abs(delsRe) + Math.abs(delsIm) < 1e-17 * (Math.abs(sRe) + Math.abs(sIm))) {
                break;
            }
        }
        Complex s = new Complex(sRe, sIm);
        Complex h = new Complex(a1 * hRe, a1 * hIm);
        Complex k0 = z.multiply(2.0 / Math.PI).sqrt().reciprocal().divide(s);
        Complex k1 = k0.multiply(z.add(0.5).subtract(h)).divide(z);
        return new Complex[] {k0, k1};
    }

    /**
     * e^(z)·K_n(z) = ∫₀^∞ exp(−z·(cosh t − 1))·cosh(n t) dt by the trapezoidal rule. The integrand is
     * analytic in the strip |Im t| &lt; π/2 − |arg z|, so the error falls like exp(−2π·d/h); with
     * h = d/8 it is far below double precision.
     */
    static Complex[] quadratureScaledK(Complex z) {
        double halfWidth = Math.PI / 2.0 - Math.abs(z.getArgument());
        double step = Math.min(0.1, halfWidth / 8.0);
        double zRe = z.getReal();
        double zIm = z.getImaginary();
        double sum0Re = 0.5;
        double sum0Im = 0.0;
        double sum1Re = 0.5;
        double sum1Im = 0.0;
        for (int n = 1; n < 100_000; n++) {
            double t = n * step;
            double coshMinusOne = 2.0 * Math.sinh(0.5 * t) * Math.sinh(0.5 * t);
            double decay = Math.exp(-zRe * coshMinusOne);
            double phase = -zIm * coshMinusOne;
            double valueRe = decay * Math.cos(phase);
            double valueIm = decay * Math.sin(phase);
            double coshT = Math.cosh(t);
            sum0Re += valueRe;
            sum0Im += valueIm;
            sum1Re += valueRe * coshT;
            sum1Im += valueIm * coshT;
            if (decay * coshT < 1e-18 * Math.abs(sum0Re)) {
                break;
            }
        }
        return new Complex[] {new Complex(sum0Re * step, sum0Im * step), new Complex(sum1Re * step, sum1Im * step)};
    }

    /** Largest argument {@link #besselJY} accepts: there its series lose about three digits to cancellation. */
    static final double JY_SERIES_LIMIT = 8.0;

    /**
     * Bessel functions of the first and second kind, orders 0 and 1, of a real argument, by their ascending
     * series: J0 and J1 by A&amp;S 9.1.10, Y0 by 9.1.13 and Y1 by 9.1.11 with n = 1,
     * <pre>Y1(x) = −2/(πx) + (2/π)·ln(x/2)·J1(x) − (x/2π)·Σ (ψ(k+1) + ψ(k+2))·(−x²/4)^k / (k!·(k+1)!).</pre>
     * Their terms grow to about I0(x) before they fall, so the sums lose log10(I0(x)/|J0(x)|) digits: none
     * worth naming below x = 2, about one at 5, three at 8. The coax's TE11 equation, their one user, needs
     * them below x ≈ 2.
     *
     * @param x argument, 0 &lt; x ≤ {@link #JY_SERIES_LIMIT}
     * @param out receives {J0(x), J1(x), Y0(x), Y1(x)}
     */
    static void besselJY(double x, double[] out) {
        if (!(x > 0 && x <= JY_SERIES_LIMIT)) {
            throw new IllegalArgumentException("Bessel J, Y series: x = " + x + " is outside (0, "
                    + JY_SERIES_LIMIT + "]");
        }
        double q = 0.25 * x * x;
        double j0 = 0;
        double j1 = 0;
        double y0Sum = 0;
        double y1Sum = 0;
        double termZero = 1.0; // (−q)^k / (k!)²
        double termOne = 1.0; // (−q)^k / (k!·(k+1)!)
        double harmonic = 0.0; // H_k = 1 + 1/2 + … + 1/k, so ψ(k+1) = −γ + H_k
        for (int k = 0; k < MAX_TERMS; k++) {
            j0 += termZero;
            j1 += termOne;
            y0Sum -= harmonic * termZero; // (−1)^(k+1)·H_k·q^k/(k!)²
            double nextHarmonic = harmonic + 1.0 / (k + 1);
            y1Sum += (harmonic + nextHarmonic - 2 * EULER_GAMMA) * termOne;
            if (k > q && Math.abs(termZero) < SERIES_TOLERANCE * Math.abs(j0)
                    && Math.abs(termOne) < SERIES_TOLERANCE * Math.abs(j1)) {
                break;
            }
            termZero *= -q / ((k + 1.0) * (k + 1.0));
            termOne *= -q / ((k + 1.0) * (k + 2.0));
            harmonic = nextHarmonic;
        }
        j1 *= 0.5 * x;
        double logHalf = Math.log(0.5 * x);
        out[0] = j0;
        out[1] = j1;
        out[2] = 2 / Math.PI * ((logHalf + EULER_GAMMA) * j0 + y0Sum);
        out[3] = -2 / (Math.PI * x) + 2 / Math.PI * logHalf * j1 - x / (2 * Math.PI) * y1Sum;
    }

    /**
     * Complete elliptic integral of the first kind K(k) from the arithmetic-geometric mean,
     * K(k) = π / (2·AGM(1, k')) (A&amp;S 17.6). Taking the complementary modulus k' = sqrt(1 − k²) as the
     * argument keeps full accuracy as k → 1, where forming 1 − k² would cancel.
     *
     * @param complementaryModulus k', in (0, 1]
     * @return K(k) for the modulus k = sqrt(1 − k'²) (not the parameter m = k²)
     */
    public static double ellipticKFromComplementaryModulus(double complementaryModulus) {
        double a = 1.0;
        double b = complementaryModulus;
        for (int i = 0; i < 64 && Math.abs(a - b) > 1e-16 * a; i++) {
            double mean = 0.5 * (a + b);
            b = Math.sqrt(a * b);
            a = mean;
        }
        return Math.PI / (a + b);
    }

    /**
     * Complete elliptic integral of the first kind K(k) for the modulus k (not the parameter m = k²).
     *
     * @param modulus k in [0, 1)
     * @return K(k)
     */
    public static double ellipticK(double modulus) {
        return ellipticKFromComplementaryModulus(Math.sqrt((1.0 - modulus) * (1.0 + modulus)));
    }
}
