package org.linesweep.physics;

import java.util.ArrayList;
import java.util.List;

/**
 * Two plates of width w and thickness t at separation d, fringing neglected: F = w/d, so C' = εw/d and
 * L'_ext = μd/w (Pozar, table of common lines). Each plate carries the current on its inner face with
 * the exact finite-thickness surface impedance Z_s(t), so R' + jωL'_int = 2·Z_s/w.
 * The first higher-order mode varies across the width: c/(2w·sqrt(εr μr)).
 */
public final class ParallelPlateLine extends HomogeneousTemLine {

    /** Width-to-separation ratio below which neglecting fringing is flagged. */
    static final double FRINGING_WARNING_RATIO = 10.0;

    private final double widthMetres;
    private final double separationMetres;
    private final double thicknessMetres;

    public ParallelPlateLine(double widthMetres, double separationMetres, double thicknessMetres,
            Conductor conductor, Dielectric dielectric) {
        super(conductor, dielectric);
        this.widthMetres = widthMetres;
        this.separationMetres = separationMetres;
        this.thicknessMetres = thicknessMetres;
        setConductorTerms(SkinEffectTerm.flat(conductor, thicknessMetres, 2.0 / widthMetres));
    }

    @Override
    protected String geometryText() {
        return "w=" + widthMetres + " d=" + separationMetres + " t=" + thicknessMetres;
    }

    @Override
    public LineType type() {
        return LineType.PARALLEL_PLATE;
    }

    @Override
    public double capacitanceFactor() {
        return widthMetres / separationMetres;
    }

    @Override
    public double characteristicHalfSizeMetres() {
        return thicknessMetres / 2;
    }

    @Override
    public double characteristicResistanceRatio(double frequencyHz) {
        return InternalImpedance.flatResistanceRatio(conductor, thicknessMetres, frequencyHz);
    }

    @Override
    public double higherModeCutoffHz() {
        return cutoffInDielectric(PhysicalConstants.SPEED_OF_LIGHT_METRES_PER_SECOND / (2 * widthMetres));
    }

    @Override
    public List<String> validityWarnings() {
        List<String> warnings = new ArrayList<>();
        if (widthMetres < FRINGING_WARNING_RATIO * separationMetres) {
            warnings.add(String.format("parallel-plate: width/separation = %.3g is below %.0f; fringing, which the"
                    + " model neglects, adds capacitance of order (d/w)·ln(w/d)",
                    widthMetres / separationMetres, FRINGING_WARNING_RATIO));
        }
        return warnings;
    }
}
