package org.linesweep.design;

import org.linesweep.physics.Dielectric;
import org.linesweep.physics.DielectricMaterial;
import org.linesweep.physics.DielectricModelKind;

/**
 * The dielectric of a design: a catalogue material (whose values any given field overrides) or raw values.
 *
 * @param materialKey the catalogue key, or null for raw values
 * @param relativePermittivity ε′ at the reference frequency
 * @param lossTangent tan δ at the reference frequency
 * @param referenceFrequencyHz where ε′ and tan δ are stated, Hz
 * @param conductivitySiemensPerMetre bulk conductivity, S/m
 * @param relativePermeability μr
 * @param model constant or wideband Debye
 * @param bandLowHz lower band edge of the wideband model, Hz
 * @param bandHighHz upper band edge of the wideband model, Hz
 */
public record DielectricSpec(String materialKey, double relativePermittivity, double lossTangent,
        double referenceFrequencyHz, double conductivitySiemensPerMetre, double relativePermeability,
        DielectricModelKind model, double bandLowHz, double bandHighHz) {

    public DielectricSpec {
        Rule.PERMITTIVITY.check("dielectric.permittivity", relativePermittivity);
        Rule.LOSS_TANGENT.check("dielectric.lossTangent", lossTangent);
        Rule.FREQUENCY.check("dielectric.referenceFrequency", referenceFrequencyHz);
        Rule.DIELECTRIC_CONDUCTIVITY.check("dielectric.conductivity", conductivitySiemensPerMetre);
        Rule.PERMEABILITY.check("dielectric.permeability", relativePermeability);
        Rule.BAND_EDGE.check("dielectric.bandLowHz", bandLowHz);
        Rule.BAND_EDGE.check("dielectric.bandHighHz", bandHighHz);
        if (bandLowHz >= bandHighHz) {
            throw new InvalidInputException("dielectric.bandLowHz", Units.engineering(bandLowHz, "Hz", 4),
                    "the lower band edge must be below dielectric.bandHighHz ("
                            + Units.engineering(bandHighHz, "Hz", 4) + ")");
        }
        if (model == null) {
            throw new InvalidInputException("dielectric.model", null, "expected \"constant\" or \"wideband-debye\"");
        }
        if (model == DielectricModelKind.WIDEBAND_DEBYE
                && (referenceFrequencyHz <= bandLowHz || referenceFrequencyHz >= bandHighHz)) {
            throw new InvalidInputException("dielectric.referenceFrequency",
                    Units.engineering(referenceFrequencyHz, "Hz", 4),
                    "the wideband Debye model needs it between the band edges ("
                            + Units.engineering(bandLowHz, "Hz", 4) + " .. " + Units.engineering(bandHighHz, "Hz", 4)
                            + ")");
        }
    }

    /** A catalogue dielectric with its default model and band edges. */
    public static DielectricSpec of(DielectricMaterial material) {
        return new DielectricSpec(material.key(), material.relativePermittivity(), material.lossTangent(),
                material.referenceFrequencyHz(), 0.0, 1.0, material.defaultModel(), Dielectric.DEFAULT_BAND_LOW_HZ,
                Dielectric.DEFAULT_BAND_HIGH_HZ);
    }

    /** This dielectric with other values at the same reference frequency: a custom material from then on. */
    public DielectricSpec withValues(double permittivity, double tangent, DielectricModelKind newModel) {
        return new DielectricSpec(null, permittivity, tangent, referenceFrequencyHz, conductivitySiemensPerMetre,
                relativePermeability, newModel, bandLowHz, bandHighHz);
    }

    /** The physics dielectric. */
    public Dielectric toDielectric() {
        return new Dielectric(relativePermittivity, lossTangent, referenceFrequencyHz, conductivitySiemensPerMetre,
                relativePermeability, model, bandLowHz, bandHighHz);
    }
}
