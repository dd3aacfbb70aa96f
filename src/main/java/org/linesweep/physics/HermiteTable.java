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
    private final double step;
    private final double lastX;
    private final double firstX;
    private final double[] valueRe;
    private final double[] valueIm;
    private final double[] slopeRe;
    private final double[] slopeIm;

    /**
     * Builds the table over [xMin, xMax] (the ends are nodes).
     *
     * @param nodesPerUnitLog nodes per unit of ln x
     */
    HermiteTable(Source source, double xMin, double xMax, int nodesPerUnitLog) {
        double span = Math.log(xMax / xMin);
        int intervals = Math.max(1, (int) Math.ceil(span * nodesPerUnitLog));
        this.firstU = Math.log(xMin);
        this.step = span / intervals;
        this.firstX = xMin;
        this.lastX = xMax;
        int nodes = intervals + 1;
        valueRe = new double[nodes];
        valueIm = new double[nodes];
        slopeRe = new double[nodes];
        slopeIm = new double[nodes];
        double[] out = new double[4];
        for (int i = 0; i < nodes; i++) {
            double x = i == intervals ? xMax : Math.exp(firstU + i * step);
            source.evaluate(x, out);
            valueRe[i] = out[0];
            valueIm[i] = out[1];
            // dG/du = x·F′(x)
            slopeRe[i] = x * out[2];
            slopeIm[i] = x * out[3];
        }
    }

    /**
     * A table of a complex function given as {F(x), F′(x)}: the internal impedances' exact forms all have that
     * shape.
     */
    static HermiteTable of(java.util.function.DoubleFunction<Complex[]> exact, double xMin, double xMax,
            int nodesPerUnitLog) {
        return new HermiteTable((x, out) -> {
            Complex[] valueAndSlope = exact.apply(x);
            out[0] = valueAndSlope[0].getReal();
            out[1] = valueAndSlope[0].getImaginary();
            out[2] = valueAndSlope[1].getReal();
            out[3] = valueAndSlope[1].getImaginary();
        }, xMin, xMax, nodesPerUnitLog);
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
        double s = (Math.log(x) - firstU) / step;
        int i = Math.min(valueRe.length - 2, Math.max(0, (int) s));
        double t = s - i;
        double t2 = t * t;
        double t3 = t2 * t;
        double h00 = 2 * t3 - 3 * t2 + 1;
        double h10 = (t3 - 2 * t2 + t) * step;
        double h01 = -2 * t3 + 3 * t2;
        double h11 = (t3 - t2) * step;
        // derivatives of the basis with respect to t, divided by the step to give d/du
        double d00 = (6 * t2 - 6 * t) / step;
        double d10 = 3 * t2 - 4 * t + 1;
        double d01 = (-6 * t2 + 6 * t) / step;
        double d11 = 3 * t2 - 2 * t;
        out[0] = h00 * valueRe[i] + h10 * slopeRe[i] + h01 * valueRe[i + 1] + h11 * slopeRe[i + 1];
        out[1] = h00 * valueIm[i] + h10 * slopeIm[i] + h01 * valueIm[i + 1] + h11 * slopeIm[i + 1];
        double duRe = d00 * valueRe[i] + d10 * slopeRe[i] + d01 * valueRe[i + 1] + d11 * slopeRe[i + 1];
        double duIm = d00 * valueIm[i] + d10 * slopeIm[i] + d01 * valueIm[i + 1] + d11 * slopeIm[i + 1];
        // F′(x) = (dG/du)/x
        out[2] = duRe / x;
        out[3] = duIm / x;
    }
}
