package org.linesweep.physics;

/**
 * The telegrapher's-equation step shared by every line type: from R', L', G', C' at angular frequency ω
 * to the propagation constant γ = sqrt(Z'Y') = α + jβ and the characteristic impedance Z0 = γ/Y'
 * (equal to the principal sqrt(Z'/Y')), with Z' = R' + jωL' and Y' = G' + jωC'.
 *
 * <p>Works on primitives so the sweep loop allocates nothing. The square root is taken in the form
 * that avoids cancellation: for a low-loss line Z'Y' ≈ −ω²L'C', and forming sqrt((|w| + Re w)/2)
 * there would lose α entirely.
 */
public final class Telegrapher {

    /** Index of α (Np/m) in the result array. */
    public static final int ALPHA = 0;
    /** Index of β (rad/m) in the result array. */
    public static final int BETA = 1;
    /** Index of Re Z0 (Ω) in the result array. */
    public static final int Z0_RE = 2;
    /** Index of Im Z0 (Ω) in the result array. */
    public static final int Z0_IM = 3;
    /** Length of the result array. */
    public static final int SIZE = 4;

    private Telegrapher() {
    }

    /**
     * Group velocity dω/dβ from the parameters, their derivatives with respect to ω and the propagation
     * constant: dγ/dω = (Z'_ω·Y' + Z'·Y'_ω)/(2γ) with Z'_ω = dR'/dω + j(L' + ω·dL'/dω) and
     * Y'_ω = dG'/dω + j(C' + ω·dC'/dω); v_g = 1/Im(dγ/dω).
     */
    public static double groupVelocity(double r, double l, double g, double c, double dr, double dl, double dg,
            double dc, double omega, double alpha, double beta) {
        double zRe = r;
        double zIm = omega * l;
        double yRe = g;
        double yIm = omega * c;
        double zwRe = dr;
        double zwIm = l + omega * dl;
        double ywRe = dg;
        double ywIm = c + omega * dc;
        double numRe = zwRe * yRe - zwIm * yIm + zRe * ywRe - zIm * ywIm;
        double numIm = zwRe * yIm + zwIm * yRe + zRe * ywIm + zIm * ywRe;
        // (num)/(2γ): imaginary part of num·conj(γ)/(2|γ|²); v_g is its reciprocal
        return 2 * (alpha * alpha + beta * beta) / (numIm * alpha - numRe * beta);
    }

    /**
     * Solves one point.
     *
     * @param out array of at least {@link #SIZE}; receives α, β, Re Z0, Im Z0
     */
    public static void solve(double r, double l, double g, double c, double omega, double[] out) {
        double zRe = r;
        double zIm = omega * l;
        double yRe = g;
        double yIm = omega * c;
        double productRe = zRe * yRe - zIm * yIm;
        double productIm = zRe * yIm + zIm * yRe;
        double modulus = Math.sqrt(productRe * productRe + productIm * productIm);
        double gammaRe;
        double gammaIm;
        if (modulus == 0.0) {
            gammaRe = 0.0;
            gammaIm = 0.0;
        } else if (productRe >= 0) {
            gammaRe = Math.sqrt(0.5 * (modulus + productRe));
            gammaIm = productIm / (2.0 * gammaRe);
        } else {
            gammaIm = Math.copySign(Math.sqrt(0.5 * (modulus - productRe)), productIm);
            gammaRe = productIm / (2.0 * gammaIm);
        }
        // Z0 = γ / Y'
        double denominator = yRe * yRe + yIm * yIm;
        out[ALPHA] = gammaRe;
        out[BETA] = gammaIm;
        out[Z0_RE] = (gammaRe * yRe + gammaIm * yIm) / denominator;
        out[Z0_IM] = (gammaIm * yRe - gammaRe * yIm) / denominator;
    }
}
