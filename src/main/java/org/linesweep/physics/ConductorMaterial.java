package org.linesweep.physics;

import java.util.Arrays;
import java.util.Optional;

/**
 * The built-in conductor catalogue: one nominal value of each property per material, at 20 °C.
 * The ranges these were chosen from, and their provenance, are in docs/physics.md; values recalled
 * from a handbook rather than read from it are marked "from memory".
 */
public enum ConductorMaterial {
    /** Annealed copper, 100 % IACS: 58.0 MS/m and 0.003 93 /K (IEC 60028, from memory). */
    COPPER("copper", 5.8e7, 0.00393, 1.0, "IEC 60028 annealed copper, 100 % IACS (from memory)"),
    /** Pure aluminium, ρ = 2.65 µΩ·cm (CRC Handbook, from memory). */
    ALUMINIUM("aluminium", 3.77e7, 0.0040, 1.0, "CRC Handbook, pure aluminium (from memory)"),
    /** Silver, ρ = 1.59 µΩ·cm (CRC Handbook, from memory). */
    SILVER("silver", 6.3e7, 0.0038, 1.0, "CRC Handbook, silver (from memory)"),
    /** Gold, the traditional engineering figure ρ = 2.44 µΩ·cm (typical, from memory). */
    GOLD("gold", 4.1e7, 0.0034, 1.0, "traditional engineering value for gold, 2.44 µΩ·cm (from memory)"),
    /** Cu-Zn 70/30 brass, about 27 % IACS (ASM Handbook vol. 2, from memory). */
    BRASS("brass", 1.59e7, 0.0017, 1.0, "ASM Handbook vol. 2, 70/30 brass (from memory)"),
    /** Tin (typical, from memory). */
    TIN("tin", 8.7e6, 0.0044, 1.0, "typical value for tin (from memory)"),
    /**
     * Nickel: ferromagnetic. μr = 100 is a low-frequency nominal at the bottom of the 100-600 range;
     * it falls to a few above the ferromagnetic resonance (1-10 GHz), so GHz work should give raw values.
     */
    NICKEL("nickel", 1.44e7, 0.006, 100.0, "CRC Handbook, nickel; μr low-frequency nominal (from memory)"),
    /** Austenitic stainless steel, ρ = 72 µΩ·cm, μr slightly above 1 when annealed (ASM, from memory). */
    STAINLESS_STEEL("stainless-steel", 1.39e6, 0.001, 1.02, "ASM Handbook, austenitic stainless (from memory)"),
    /** A lossless conductor, for ideal-line checks. */
    PERFECT("perfect", Double.POSITIVE_INFINITY, 0.0, 1.0, "ideal lossless conductor");

    private final String key;
    private final double conductivitySiemensPerMetre;
    private final double temperatureCoefficientPerKelvin;
    private final double relativePermeability;
    private final String source;

    ConductorMaterial(String key, double conductivitySiemensPerMetre, double temperatureCoefficientPerKelvin,
            double relativePermeability, String source) {
        this.key = key;
        this.conductivitySiemensPerMetre = conductivitySiemensPerMetre;
        this.temperatureCoefficientPerKelvin = temperatureCoefficientPerKelvin;
        this.relativePermeability = relativePermeability;
        this.source = source;
    }

    /** The name used in design files, e.g. {@code stainless-steel}. */
    public String key() {
        return key;
    }

    /** Conductivity at 20 °C, S/m (infinite for the perfect conductor). */
    public double conductivitySiemensPerMetre() {
        return conductivitySiemensPerMetre;
    }

    /** Linear temperature coefficient of resistivity at 20 °C, 1/K. */
    public double temperatureCoefficientPerKelvin() {
        return temperatureCoefficientPerKelvin;
    }

    /** Relative permeability μr of the conductor. */
    public double relativePermeability() {
        return relativePermeability;
    }

    /** Where the nominal values come from. */
    public String source() {
        return source;
    }

    /** Finds a material by its design-file key. */
    public static Optional<ConductorMaterial> byKey(String key) {
        return Arrays.stream(values()).filter(m -> m.key.equals(key)).findFirst();
    }
}
