package org.linesweep.physics;

/**
 * A conductor at its operating temperature.
 *
 * <p>Resistivity is linear in temperature about 20 °C, ρ(T) = ρ20·[1 + α20·(T − 20 °C)] (the law
 * behind IEC 60028's 0.003 93 /K for annealed copper).
 *
 * @param conductivityAt20CSiemensPerMetre σ at 20 °C, S/m; {@code +∞} for a perfect conductor
 * @param temperatureCoefficientPerKelvin α20, 1/K
 * @param relativePermeability μr of the metal, ≥ 1
 * @param roughnessRmsMetres RMS surface roughness Δ for the Hammerstad factor, m, ≥ 0
 * @param temperatureKelvin operating temperature, K
 */
public record Conductor(double conductivityAt20CSiemensPerMetre, double temperatureCoefficientPerKelvin,
        double relativePermeability, double roughnessRmsMetres, double temperatureKelvin) {

    /** 20 °C in kelvin, the reference temperature of the catalogue. */
    public static final double REFERENCE_TEMPERATURE_KELVIN = 20.0 + PhysicalConstants.ZERO_CELSIUS_KELVIN;

    /** A catalogue conductor, smooth, at the given temperature. */
    public static Conductor of(ConductorMaterial material, double temperatureKelvin) {
        return new Conductor(material.conductivitySiemensPerMetre(), material.temperatureCoefficientPerKelvin(),
                material.relativePermeability(), 0.0, temperatureKelvin);
    }

    /** True when the conductor is lossless. */
    public boolean isPerfect() {
        return Double.isInfinite(conductivityAt20CSiemensPerMetre);
    }

    /** Conductivity at the operating temperature, S/m. */
    public double conductivitySiemensPerMetre() {
        double factor = 1.0 + temperatureCoefficientPerKelvin * (temperatureKelvin - REFERENCE_TEMPERATURE_KELVIN);
        return conductivityAt20CSiemensPerMetre / factor;
    }

    /** Absolute permeability μ0·μr, H/m. */
    public double permeabilityHenryPerMetre() {
        return PhysicalConstants.VACUUM_PERMEABILITY_HENRY_PER_METRE * relativePermeability;
    }

    /** Skin depth δ = 1/sqrt(π f μ σ), m; 0 for a perfect conductor. */
    public double skinDepthMetres(double frequencyHz) {
        if (isPerfect()) {
            return 0.0;
        }
        return 1.0 / Math.sqrt(Math.PI * frequencyHz * permeabilityHenryPerMetre() * conductivitySiemensPerMetre());
    }

    /** Surface resistance Rs = 1/(σδ), Ω per square. */
    public double surfaceResistanceOhm(double frequencyHz) {
        if (isPerfect()) {
            return 0.0;
        }
        return 1.0 / (conductivitySiemensPerMetre() * skinDepthMetres(frequencyHz));
    }


    /**
     * Hammerstad's roughness factor K = 1 + (2/π)·atan(1.4·(Δ/δ)²) (E. Hammerstad and Ø. Jensen,
     * "Accurate models for microstrip computer-aided design", IEEE MTT-S Digest 1980, a fit to
     * S. P. Morgan, J. Appl. Phys. 20, 1949). It tends to 1 at low frequency and saturates at 2.
     */
    public double roughnessFactor(double frequencyHz) {
        if (roughnessRmsMetres <= 0 || isPerfect()) {
            return 1.0;
        }
        double ratio = roughnessRmsMetres / skinDepthMetres(frequencyHz);
        return 1.0 + (2.0 / Math.PI) * Math.atan(1.4 * ratio * ratio);
    }
}
