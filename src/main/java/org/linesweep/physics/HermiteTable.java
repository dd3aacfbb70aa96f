package org.linesweep.physics;

import org.apache.commons.math3.complex.Complex;

/**
 * A complex function F(x) of a real x &gt; 0 and its derivative F′(x), tabulated on a uniform grid in u = ln x
 * and read back by cubic Hermite interpolation of G(u) = F(e^u) from its values and slopes dG/du = x·F′(x) at
 * the nodes. With n nodes per unit of ln x the interpolation error is about (1/n)⁴/384 of G's fourth
 * derivative for the value and (1/n)³/24-ish of it for the slope; the tables here use n ≥ 128 on smooth
 * functions (internal impedances vary on the scale of ln x ≈ 1), which keeps the value within about 1e-10
 * and the slope within about 1e-7 of the exact function (both measured in the tests).
 *
 * <p>Why: the exact internal impedances need complex Bessel functions, 0.3 to 2.5 µs a point; a table
 * lookup is one logarithm and some twenty multiplications. Immutable once built; safe to share.
 */
final class HermiteTable {

    /** The function tabulated: writes {Re F, Im F, Re F′, Im F′} at x. */
    interface Source {
        void evaluate(double x, double[] out);
    }

    private final double firstU;
    private final double lastU;
    private final double step;
    private final double inverseStep;
    private final double lastX;
    private final double firstX;
    private final int lastCell;
    /**
     * Per cell between nodes k and k + 1, the cubic in t = (u − u_k)/step that the Hermite interpolant is, for the
     * real then the imaginary part: {re0, re1, re2, re3, im0, im1, im2, im3}, so a lookup reads one contiguous
     * run of eight numbers and evaluates two short polynomials.
     */
    private final double[] cells;

    /**
     * A sweep table is built only when the sweep has at least this many points per node in the table's range: a
     * node costs about what an exact point does, a look-up a small fraction of it.
     */
    static final double POINTS_PER_NODE = 1.5;

    /**
     * True when a table over [xMin, xMax] at {@code nodesPerUnitLog} would cost less than evaluating the
     * {@code points} points that fall in that range exactly (see {@link #POINTS_PER_NODE}).
     */
    static boolean pays(double xMin, double xMax, int nodesPerUnitLog, int points) {
        double nodes = Math.log(xMax / xMin) * nodesPerUnitLog + 1;
        return nodes * POINTS_PER_NODE <= points;
    }

    /** Several complex functions of the same x evaluated together: writes {Re F, Im F, Re F′, Im F′} for each. */
    interface SeveralSource {
        void evaluate(double x, double[] out);
    }

    /**
     * Builds the table over [xMin, xMax] (the ends are nodes).
     *
     * @param nodesPerUnitLog nodes per unit of ln x
     */
    HermiteTable(Source source, double xMin, double xMax, int nodesPerUnitLog) {
        this(new Nodes(xMin, xMax, nodesPerUnitLog, 1, source::evaluate), 0);
    }

    /**
     * Builds {@code count} tables over the same nodes from one evaluation per node: for functions that share most
     * of their work.
     */
    static HermiteTable[] several(int count, SeveralSource source, double xMin, double xMax, int nodesPerUnitLog) {
        Nodes nodes = new Nodes(xMin, xMax, nodesPerUnitLog, count, source);
        HermiteTable[] tables = new HermiteTable[count];
        for (int j = 0; j < count; j++) {
            tables[j] = new HermiteTable(nodes, j);
        }
        return tables;
    }

    /** The functions' values and slopes per unit of t at the nodes of a uniform grid in ln x. */
    private static final class Nodes {
        final double xMin;
        final double xMax;
        final double firstU;
        final double step;
        final int intervals;
        /** [function][node]: value Re, value Im, slope Re, slope Im. */
        final double[][] valueRe;
        final double[][] valueIm;
        final double[][] slopeRe;
        final double[][] slopeIm;

        Nodes(double xMin, double xMax, int nodesPerUnitLog, int functions, SeveralSource source) {
            double span = Math.log(xMax / xMin);
            this.xMin = xMin;
            this.xMax = xMax;
            this.intervals = Math.max(1, (int) Math.ceil(span * nodesPerUnitLog));
            this.firstU = Math.log(xMin);
            this.step = span / intervals;
            int nodes = intervals + 1;
            valueRe = new double[functions][nodes];
            valueIm = new double[functions][nodes];
            slopeRe = new double[functions][nodes];
            slopeIm = new double[functions][nodes];
            double[] out = new double[4 * functions];
            for (int i = 0; i < nodes; i++) {
                double x = i == intervals ? xMax : Math.exp(firstU + i * step);
                source.evaluate(x, out);
                for (int j = 0; j < functions; j++) {
                    valueRe[j][i] = out[4 * j];
                    valueIm[j][i] = out[4 * j + 1];
                    // dG/du = x·F′(x), times the step: the slope per unit of t
                    slopeRe[j][i] = x * out[4 * j + 2] * step;
                    slopeIm[j][i] = x * out[4 * j + 3] * step;
                }
            }
        }
    }

    private HermiteTable(Nodes nodes, int function) {
        int intervals = nodes.intervals;
        this.firstU = nodes.firstU;
        this.lastU = Math.log(nodes.xMax);
        this.step = nodes.step;
        this.inverseStep = 1.0 / nodes.step;
        this.firstX = nodes.xMin;
        this.lastX = nodes.xMax;
        this.lastCell = intervals - 1;
        double[] valueRe = nodes.valueRe[function];
        double[] valueIm = nodes.valueIm[function];
        double[] slopeRe = nodes.slopeRe[function];
        double[] slopeIm = nodes.slopeIm[function];
        cells = new double[8 * intervals];
        for (int k = 0; k < intervals; k++) {
            cubic(valueRe[k], slopeRe[k], valueRe[k + 1], slopeRe[k + 1], cells, 8 * k);
            cubic(valueIm[k], slopeIm[k], valueIm[k + 1], slopeIm[k + 1], cells, 8 * k + 4);
        }
    }

    /**
     * The cubic c0 + c1·t + c2·t² + c3·t³ on t ∈ [0, 1] with the given end values p0, p1 and end slopes m0, m1
     * (per unit of t): the cubic Hermite interpolant written in powers of t.
     */
    private static void cubic(double p0, double m0, double p1, double m1, double[] into, int at) {
        into[at] = p0;
        into[at + 1] = m0;
        into[at + 2] = -3 * p0 - 2 * m0 + 3 * p1 - m1;
        into[at + 3] = 2 * p0 + m0 - 2 * p1 + m1;
    }

    /**
     * A table of a complex function given as {F(x), F′(x)}: the internal impedances' exact forms all have that
     * shape.
     */
    static HermiteTable of(java.util.function.DoubleFunction<Complex[]> exact, double xMin, double xMax,
            int nodesPerUnitLog) {
        return new HermiteTable(source(exact), xMin, xMax, nodesPerUnitLog);
    }

    /** A function given as {F(x), F′(x)}, as a source. */
    static Source source(java.util.function.DoubleFunction<Complex[]> exact) {
        return (x, out) -> {
            Complex[] valueAndSlope = exact.apply(x);
            out[0] = valueAndSlope[0].getReal();
            out[1] = valueAndSlope[0].getImaginary();
            out[2] = valueAndSlope[1].getReal();
            out[3] = valueAndSlope[1].getImaginary();
        };
    }

    /** {F(x), F′(x)} at a {@linkplain #covers covered} x, as complex numbers. */
    Complex[] valueAndSlope(double x) {
        double[] out = new double[4];
        evaluate(x, out);
        return new Complex[] {new Complex(out[0], out[1]), new Complex(out[2], out[3])};
    }

    /** True when x lies inside the table. */
    boolean covers(double x) {
        return x >= firstX && x <= lastX;
    }

    /**
     * Interpolates F and F′ at x, which must be {@linkplain #covers covered}.
     *
     * @param out receives {Re F, Im F, Re F′, Im F′}
     */
    void evaluate(double x, double[] out) {
        evaluateLog(Math.log(x), out);
        // F′(x) = (dG/du)/x
        out[2] /= x;
        out[3] /= x;
    }

    /** True when u = ln x lies inside the table. */
    boolean coversLog(double u) {
        return u >= firstU && u <= lastU;
    }

    /**
     * Interpolates G(u) = F(e^u) and dG/du at u = ln x, which must be {@linkplain #coversLog covered}: the form a
     * sweep wants, since it knows ln f and its quantities depend on ln x linearly (x ∝ f or x ∝ sqrt f), so no
     * logarithm or division per lookup.
     *
     * @param out receives {Re G, Im G, Re dG/du, Im dG/du}
     */
    void evaluateLog(double u, double[] out) {
        double s = (u - firstU) * inverseStep;
        int cell = Math.min(lastCell, Math.max(0, (int) s));
        double t = s - cell;
        int at = 8 * cell;
        double[] c = cells;
        double re1 = c[at + 1];
        double re2 = c[at + 2];
        double re3 = c[at + 3];
        double im1 = c[at + 5];
        double im2 = c[at + 6];
        double im3 = c[at + 7];
        out[0] = c[at] + t * (re1 + t * (re2 + t * re3));
        out[1] = c[at + 4] + t * (im1 + t * (im2 + t * im3));
        out[2] = (re1 + t * (2 * re2 + t * 3 * re3)) * inverseStep;
        out[3] = (im1 + t * (2 * im2 + t * 3 * im3)) * inverseStep;
    }
}
