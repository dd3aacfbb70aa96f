package org.linesweep.design;

import org.linesweep.physics.Conductor;
import org.linesweep.physics.ConductorMaterial;

/**
 * The conductor of a design: a catalogue material (whose values any given field overrides) or raw values.
 *
 * @param materialKey the catalogue key, or null for raw values
 * @param conductivitySiemensPerMetre σ at 20 °C, S/m; +∞ only for the perfect conductor
 * @param temperatureCoefficientPerKelvin α20, 1/K
 * @param relativePermeability μr
 * @param roughnessRmsMetres RMS roughness, m
 */
public record ConductorSpec(String materialKey, double conductivitySiemensPerMetre,
        double temperatureCoefficientPerKelvin, double relativePermeability, double roughnessRmsMetres) {

    public ConductorSpec {
        boolean perfect = Double.isInfinite(conductivitySiemensPerMetre) && conductivitySiemensPerMetre > 0
                && ConductorMaterial.PERFECT.key().equals(materialKey);
        if (!perfect) {
            Rule.CONDUCTIVITY.check("conductor.conductivity", conductivitySiemensPerMetre);
        }
        Rule.TEMPERATURE_COEFFICIENT.check("conductor.temperatureCoefficient", temperatureCoefficientPerKelvin);
        Rule.PERMEABILITY.check("conductor.permeability", relativePermeability);
        Rule.ROUGHNESS.check("conductor.roughnessRms", roughnessRmsMetres);
    }

    /** A smooth catalogue conductor. */
    public static ConductorSpec of(ConductorMaterial material) {
        return new ConductorSpec(material.key(), material.conductivitySiemensPerMetre(),
                material.temperatureCoefficientPerKelvin(), material.relativePermeability(), 0.0);
    }

    /** True for the lossless conductor. */
    public boolean isPerfect() {
        return Double.isInfinite(conductivitySiemensPerMetre) && conductivitySiemensPerMetre > 0
                && ConductorMaterial.PERFECT.key().equals(materialKey);
    }

    /** This conductor with another roughness. */
    public ConductorSpec withRoughness(double roughnessMetres) {
        return new ConductorSpec(materialKey, conductivitySiemensPerMetre, temperatureCoefficientPerKelvin,
                relativePermeability, roughnessMetres);
    }

    /** This conductor with another conductivity and permeability: a custom material from then on. */
    public ConductorSpec withValues(double conductivity, double permeability) {
        return new ConductorSpec(null, conductivity, temperatureCoefficientPerKelvin, permeability, roughnessRmsMetres);
    }

    /** The physics conductor at a temperature. */
    public Conductor toConductor(double temperatureKelvin) {
        return new Conductor(conductivitySiemensPerMetre, temperatureCoefficientPerKelvin, relativePermeability,
                roughnessRmsMetres, temperatureKelvin);
    }
}
