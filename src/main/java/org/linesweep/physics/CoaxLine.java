package org.linesweep.physics;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * Coaxial line: solid round inner conductor of radius a, tubular outer conductor of inner radius b and
 * wall thickness t, filled with one dielectric.
 *
 * <p>F = 2π/ln(b/a) (any transmission-line text, e.g. Pozar, Microwave Engineering, table of common
 * lines). The inner conductor's internal impedance is the exact round-wire result and the outer
 * conductor's the exact tube result, both from Schelkunoff (1934): see {@link InternalImpedance}.
 * The first higher-order mode is TE11, found exactly by {@link CoaxModes}.
 */
public final class CoaxLine extends HomogeneousTemLine {

    private final double innerRadiusMetres;
    private final double outerRadiusMetres;
    private final double outerWallMetres;
    private final double capacitanceFactor;
    private volatile double cachedTe11Hz = Double.NaN;
    /** The outer tube's Z/R_dc tabulated for this line's c/b over a sweep's range; null until a sweep asks. */
    private volatile HermiteTable tubeTable;

    /**
     * @param innerDiameterMetres diameter 2a of the inner conductor
     * @param outerDiameterMetres inside diameter 2b of the outer conductor, &gt; 2a
     * @param outerThicknessMetres wall thickness t of the outer conductor, &gt; 0
     */
    public CoaxLine(double innerDiameterMetres, double outerDiameterMetres, double outerThicknessMetres,
            Conductor conductor, Dielectric dielectric) {
        super(conductor, dielectric);
        this.innerRadiusMetres = innerDiameterMetres / 2;
        this.outerRadiusMetres = outerDiameterMetres / 2;
        this.outerWallMetres = outerThicknessMetres;
        this.capacitanceFactor = 2 * Math.PI / Math.log1p((outerRadiusMetres - innerRadiusMetres) / innerRadiusMetres);
    }

    @Override
    protected String geometryText() {
        return "a=" + innerRadiusMetres + " b=" + outerRadiusMetres + " wall=" + outerWallMetres;
    }

    /**
     * Tabulates the outer tube over the sweep's thin-wall range (b/δ below 20 skin depths of wall) when the
     * sweep has at least {@link #POINTS_PER_TUBE_NODE} points there per table node (a node costs one exact
     * evaluation, a lookup a fortieth of one), reusing a recent table of the same c/b when it covers the range.
     */
    @Override
    public void prepareForSweep(double[] frequenciesHz, int count) {
        if (conductor.isPerfect()) {
            return;
        }
        double kappa = (outerRadiusMetres + outerWallMetres) / outerRadiusMetres;
        double thickLimit = InternalImpedance.THICK_WALL_SKIN_DEPTHS / (kappa - 1.0);
        double low = Double.POSITIVE_INFINITY;
        double high = 0.0;
        int inside = 0;
        for (int i = 0; i < count; i++) {
            double x = outerRadiusMetres / conductor.skinDepthMetres(frequenciesHz[i]);
            if (x <= thickLimit && x >= TUBE_TABLE_SMALLEST_X) {
                inside++;
                low = Math.min(low, x);
                high = Math.max(high, x);
            }
        }
        HermiteTable existing = tubeTable;
        if (inside < 2 || !(high > low) || (existing != null && existing.covers(low) && existing.covers(high))) {
            return;
        }
        double nodes = Math.log(high / low) * InternalImpedance.TUBE_TABLE_NODES_PER_UNIT_LOG + 1;
        if (nodes * POINTS_PER_TUBE_NODE <= inside) {
            tubeTable = InternalImpedance.sharedTubeTable(kappa, low, high);
        }
    }

    /** A tube table is built only for sweeps with at least this many thin-wall points per node. */
    static final double POINTS_PER_TUBE_NODE = 1.5;
    /** Below b/δ = 0.01 the tube is at its DC value to 1e-9; the exact form is cheap there. */
    static final double TUBE_TABLE_SMALLEST_X = 0.01;

    @Override
    public LineType type() {
        return LineType.COAX;
    }

    @Override
    public double capacitanceFactor() {
        return capacitanceFactor;
    }

    @Override
    public Complex[] conductorImpedanceWithSlope(double frequencyHz) {
        Complex[] inner = InternalImpedance.roundWireWithSlope(conductor, innerRadiusMetres, frequencyHz);
        Complex[] outer = InternalImpedance.tubeWithSlope(conductor, outerRadiusMetres,
                outerRadiusMetres + outerWallMetres, frequencyHz, tubeTable);
        return new Complex[] {inner[0].add(outer[0]), inner[1].add(outer[1])};
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return innerRadiusMetres;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        if (conductor.isPerfect()) {
            return Double.NaN;
        }
        return InternalImpedance.roundWireRatio(innerRadiusMetres / conductor.skinDepthMetres(frequencyHz))
                .getReal() * conductor.roughnessFactor(frequencyHz);
    }

    /** TE11 cutoff from the exact root of the Bessel cross-product equation, in the line's dielectric. */
    @Override
    public double higherModeCutoffHz() {
        double cached = cachedTe11Hz;
        if (Double.isNaN(cached)) {
            double x = CoaxModes.te11CutoffTimesInnerRadius(outerRadiusMetres / innerRadiusMetres);
            double freeSpace = x * PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / (2 * Math.PI * innerRadiusMetres);
            cached = cutoffInDielectric(freeSpace);
            cachedTe11Hz = cached;
        }
        return cached;
    }

    @Override
    public List<String> validityWarnings() {
        List<String> warnings = new ArrayList<>();
        if (outerWallMetres > outerRadiusMetres) {
            warnings.add("coax: the outer wall is thicker than the outer radius; the tube model still applies,"
                    + " but check the dimensions");
        }
        return warnings;
    }

    public double innerRadiusMetres() {
        return innerRadiusMetres;
    }

    public double outerRadiusMetres() {
        return outerRadiusMetres;
    }
}
