package org.linesweep.physics;

/**
 * A stand-in for an expensive smooth {@link HermiteTable.Source}: the source is evaluated exactly at the Chebyshev
 * points of short pieces of u = ln x, and anything between is read from the polynomial through them by the
 * barycentric formula (J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM Review 46(3),
 * 2004, eq. 5.2 with the weights of Chebyshev points of the second kind, (−1)^j halved at the ends).
 *
 * <p>Why: a cubic Hermite table needs its nodes close together (128 per unit of ln x for 1e-10) because each cell
 * is a cubic; a polynomial through Chebyshev points converges geometrically instead, at a rate set by the
 * distance to the function's nearest complex singularity. The internal impedances of a tube have poles at
 * Im u = ±π/4 (there (1 + j)·x is imaginary and the modified Bessel functions turn into J and Y, whose cross
 * products vanish); on pieces one unit long that gives a Bernstein ellipse of ρ ≈ 3.4, so 25 points per piece
 * reach about 1e-13 (measured: within 4e-13 of a table from exact nodes, c/b from 1.005 to 100). Neighbouring
 * pieces share their end point, so filling a table's nodes from the samples costs 25 exact evaluations per
 * unit of ln x, the check included, instead of 128. Each piece is checked against one more exact evaluation
 * between its points; a piece that misses {@link #VALUE_TOLERANCE} or {@link #SLOPE_TOLERANCE} makes
 * {@link #tableOf} fall back to exact nodes, so the table is never less accurate than one built from exact
 * nodes by more than the check allows.
 */
final class ChebyshevSampler implements HermiteTable.Source {

    /** Chebyshev points per piece (the polynomial's degree plus one). */
    static final int POINTS_PER_PIECE = 25;
    /** Longest piece, in units of ln x. */
    static final double PIECE_LOG_SPAN = 1.0;
    /** Largest |ΔG|/|G| allowed at a piece's check point. */
    static final double VALUE_TOLERANCE = 1e-12;
    /** Largest |ΔG′|/(|G′| + |G|) allowed at a piece's check point, G′ = dG/du. */
    static final double SLOPE_TOLERANCE = 1e-10;

    /**
     * Filling one table node from the samples (a barycentric sum over {@link #POINTS_PER_PIECE} points and a
     * logarithm) costs about this fraction of one exact internal-impedance evaluation (measured: 0.1-0.2 µs
     * against 1-5 µs).
     */
    static final double NODE_FILL_COST = 0.1;

    private final double firstU;
    private final double pieceSpan;
    private final int pieces;
    /** Per piece: the Chebyshev points in u, then Re G, Im G, Re dG/du, Im dG/du at them. */
    private final double[][] nodeU;
    private final double[][][] samples;
    private final boolean accurate;

    private ChebyshevSampler(HermiteTable.Source exact, double xMin, double xMax) {
        firstU = Math.log(xMin);
        double span = Math.log(xMax / xMin);
        pieces = pieceCount(span);
        pieceSpan = span / pieces;
        nodeU = new double[pieces][POINTS_PER_PIECE];
        samples = new double[pieces][4][POINTS_PER_PIECE];
        double[] out = new double[4];
        boolean allAccurate = true;
        int last = POINTS_PER_PIECE - 1;
        for (int p = 0; p < pieces; p++) {
            double centre = firstU + (p + 0.5) * pieceSpan;
            double half = 0.5 * pieceSpan;
            for (int j = 0; j <= last; j++) {
                // x_j = cos(jπ/(n−1)), in decreasing order: a piece's last point is the first of the piece before
                if (j == last && p > 0) {
                    nodeU[p][j] = nodeU[p - 1][0];
                    for (int c = 0; c < 4; c++) {
                        samples[p][c][j] = samples[p - 1][c][0];
                    }
                    continue;
                }
                double u = centre + half * Math.cos(Math.PI * j / last);
                nodeU[p][j] = u;
                sample(exact, u, out);
                for (int c = 0; c < 4; c++) {
                    samples[p][c][j] = out[c];
                }
            }
            allAccurate &= checkPiece(exact, p, centre + half * Math.cos(Math.PI * 0.5 / last), out);
        }
        accurate = allAccurate;
    }

    /**
     * A table of {@code exact} over [xMin, xMax], its nodes read from a sampler when the sampler passes its
     * checks, else evaluated exactly.
     */
    static HermiteTable tableOf(HermiteTable.Source exact, double xMin, double xMax, int nodesPerUnitLog) {
        ChebyshevSampler sampler = new ChebyshevSampler(exact, xMin, xMax);
        return new HermiteTable(sampler.accurate ? sampler : exact, xMin, xMax, nodesPerUnitLog);
    }

    /**
     * True when a sampled table over [xMin, xMax] costs less than evaluating the {@code points} sweep points that
     * fall in that range exactly, with the same margin as {@link HermiteTable#pays}.
     */
    static boolean pays(double xMin, double xMax, int nodesPerUnitLog, int points) {
        double span = Math.log(xMax / xMin);
        // each piece: its points but the one shared with the piece before, and its check
        double exactEvaluations = pieceCount(span) * POINTS_PER_PIECE + 1.0
                + (span * nodesPerUnitLog + 1) * NODE_FILL_COST;
        return exactEvaluations * HermiteTable.POINTS_PER_NODE <= points;
    }

    /** Pieces of at most {@link #PIECE_LOG_SPAN} over a span of ln x. */
    private static int pieceCount(double span) {
        return Math.max(1, (int) Math.ceil(span / PIECE_LOG_SPAN));
    }

    /** Whether every piece met the tolerances (for the tests). */
    static boolean passesChecks(HermiteTable.Source exact, double xMin, double xMax) {
        return new ChebyshevSampler(exact, xMin, xMax).accurate;
    }

    /** The interpolant itself, checked or not (for the tests). */
    static HermiteTable.Source sampled(HermiteTable.Source exact, double xMin, double xMax) {
        return new ChebyshevSampler(exact, xMin, xMax);
    }

    /** Exact G and dG/du at u, as {Re G, Im G, Re dG/du, Im dG/du}. */
    private static void sample(HermiteTable.Source exact, double u, double[] out) {
        double x = Math.exp(u);
        exact.evaluate(x, out);
        out[2] *= x;
        out[3] *= x;
    }

    /** Compares the interpolant with the exact function at u, a point between the piece's first two points. */
    private boolean checkPiece(HermiteTable.Source exact, int piece, double u, double[] out) {
        sample(exact, u, out);
        double[] interpolated = new double[4];
        interpolate(piece, u, interpolated);
        double value = Math.hypot(out[0], out[1]);
        double slope = Math.hypot(out[2], out[3]);
        double valueError = Math.hypot(interpolated[0] - out[0], interpolated[1] - out[1]);
        double slopeError = Math.hypot(interpolated[2] - out[2], interpolated[3] - out[3]);
        return valueError <= VALUE_TOLERANCE * value && slopeError <= SLOPE_TOLERANCE * (slope + value);
    }

    /** Writes {Re F, Im F, Re F′, Im F′} at x (F′ = dF/dx), from the piece that holds ln x. */
    @Override
    public void evaluate(double x, double[] out) {
        double u = Math.log(x);
        int piece = Math.min(pieces - 1, Math.max(0, (int) ((u - firstU) / pieceSpan)));
        interpolate(piece, u, out);
        out[2] /= x;
        out[3] /= x;
    }

    /** The barycentric formula of the second kind at u for all four components. */
    private void interpolate(int piece, double u, double[] out) {
        double[] points = nodeU[piece];
        double[][] values = samples[piece];
        int last = POINTS_PER_PIECE - 1;
        double denominator = 0;
        double re = 0;
        double im = 0;
        double slopeRe = 0;
        double slopeIm = 0;
        for (int j = 0; j <= last; j++) {
            double difference = u - points[j];
            if (difference == 0) {
                for (int c = 0; c < 4; c++) {
                    out[c] = values[c][j];
                }
                return;
            }
            double weight = ((j & 1) == 0 ? 1.0 : -1.0) * (j == 0 || j == last ? 0.5 : 1.0) / difference;
            denominator += weight;
            re += weight * values[0][j];
            im += weight * values[1][j];
            slopeRe += weight * values[2][j];
            slopeIm += weight * values[3][j];
        }
        out[0] = re / denominator;
        out[1] = im / denominator;
        out[2] = slopeRe / denominator;
        out[3] = slopeIm / denominator;
    }
}
