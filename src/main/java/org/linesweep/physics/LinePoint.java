package org.linesweep.physics;

/**
 * Everything the model says about a line at one frequency.
 *
 * @param frequencyHz f, Hz
 * @param resistanceOhmPerMetre R', Ω/m
 * @param inductanceHenryPerMetre L' (external plus internal), H/m
 * @param conductanceSiemensPerMetre G', S/m
 * @param capacitanceFaradPerMetre C', F/m
 * @param z0RealOhm Re Z0, Ω
 * @param z0ImaginaryOhm Im Z0, Ω
 * @param alphaNepersPerMetre attenuation constant α, Np/m
 * @param betaRadiansPerMetre phase constant β, rad/m
 * @param groupVelocityMetresPerSecond dω/dβ of the model at f, m/s
 * @param effectivePermittivity ε′(f) on homogeneous lines, ε_eff(f) on microstrip
 * @param skinDepthMetres skin depth in the line's characteristic conductor, m; NaN for a perfect conductor
 */
public record LinePoint(double frequencyHz, double resistanceOhmPerMetre, double inductanceHenryPerMetre,
        double conductanceSiemensPerMetre, double capacitanceFaradPerMetre, double z0RealOhm,
        double z0ImaginaryOhm, double alphaNepersPerMetre, double betaRadiansPerMetre,
        double groupVelocityMetresPerSecond, double effectivePermittivity, double skinDepthMetres) {

    /** Attenuation, dB/m. */
    public double alphaDbPerMetre() {
        return alphaNepersPerMetre * PhysicalConstants.DECIBELS_PER_NEPER;
    }

    /** |Z0|, Ω. */
    public double z0MagnitudeOhm() {
        return Math.hypot(z0RealOhm, z0ImaginaryOhm);
    }

    /** Phase velocity ω/β, m/s. */
    public double phaseVelocityMetresPerSecond() {
        return 2 * Math.PI * frequencyHz / betaRadiansPerMetre;
    }

    /** Wavelength on the line 2π/β, m. */
    public double wavelengthMetres() {
        return 2 * Math.PI / betaRadiansPerMetre;
    }

    /** Electrical length L/λ of a line of the given length, in wavelengths. */
    public double electricalLengthWavelengths(double lengthMetres) {
        return lengthMetres * betaRadiansPerMetre / (2 * Math.PI);
    }

    /** Total loss of a line of the given length, dB. */
    public double totalLossDb(double lengthMetres) {
        return alphaDbPerMetre() * lengthMetres;
    }

    /** Phase delay of a line of the given length, s. */
    public double delaySeconds(double lengthMetres) {
        return lengthMetres / phaseVelocityMetresPerSecond();
    }
}
