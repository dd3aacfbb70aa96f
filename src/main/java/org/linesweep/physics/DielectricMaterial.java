package org.linesweep.physics;

import java.util.Arrays;
import java.util.Optional;

/**
 * The built-in dielectric catalogue: one nominal relative permittivity and loss tangent per material, at
 * a reference frequency, with the model used by default. The values are picked from the typical ranges
 * given in docs/physics.md (von Hippel's tables and general practice, from memory).
 */
public enum DielectricMaterial {
    /** Dry air, taken as εr = 1 (the true 1.000 54-1.000 59 shifts v_p by 0.03 %). */
    AIR("air", 1.0, 0.0, 1e9, DielectricModelKind.CONSTANT, "vacuum value; dry air 1.0005 (from memory)"),
    /** Solid PTFE, εr 2.02-2.10, tan δ 1-3e-4 (typical, from memory). */
    PTFE("ptfe", 2.06, 2e-4, 1e9, DielectricModelKind.CONSTANT, "typical range 2.02-2.10 (from memory)"),
    /** Solid polyethylene, εr 2.25-2.30, tan δ 2-5e-4 (typical, from memory). */
    POLYETHYLENE("polyethylene", 2.27, 3e-4, 1e9, DielectricModelKind.CONSTANT,
            "typical range 2.25-2.30 (from memory)"),
    /** Foamed (cellular) polyethylene, εr 1.3-1.6 depending on gas fraction (typical, from memory). */
    FOAM_POLYETHYLENE("foam-polyethylene", 1.45, 1e-4, 1e9, DielectricModelKind.CONSTANT,
            "typical range 1.3-1.6 (from memory)"),
    /** Polypropylene, εr 2.2-2.3 (typical, from memory). */
    POLYPROPYLENE("polypropylene", 2.25, 3e-4, 1e9, DielectricModelKind.CONSTANT,
            "typical range 2.2-2.3 (from memory)"),
    /** Woven-glass epoxy laminate, εr 3.9-4.4 at 1-10 GHz, tan δ 0.015-0.025 (typical, from memory). */
    EPOXY_GLASS("epoxy-glass", 4.2, 0.02, 1e9, DielectricModelKind.WIDEBAND_DEBYE,
            "typical range 3.9-4.4 at 1-10 GHz (from memory)"),
    /** Polyimide film or laminate, εr 3.2-3.5, tan δ 0.002-0.008 (typical, from memory). */
    POLYIMIDE("polyimide", 3.4, 0.004, 1e9, DielectricModelKind.WIDEBAND_DEBYE,
            "typical range 3.2-3.5 (from memory)"),
    /** 99.5 % alumina ceramic, εr 9.8-9.9, tan δ 0.5-2e-4 (typical, from memory). */
    ALUMINA("alumina", 9.8, 1e-4, 1e9, DielectricModelKind.CONSTANT, "99.5 % grade, typical (from memory)"),
    /** Fused silica, εr 3.78-3.82 (typical, from memory). */
    FUSED_SILICA("fused-silica", 3.8, 1e-4, 1e9, DielectricModelKind.CONSTANT,
            "typical range 3.78-3.82 (from memory)"),
    /** A low-permittivity grade of the PTFE-ceramic laminate class (2.9-10.2), typical, from memory. */
    PTFE_CERAMIC("ptfe-ceramic", 3.0, 0.0013, 1e10, DielectricModelKind.WIDEBAND_DEBYE,
            "low grade of the 2.9-10.2 class (from memory)");

    private final String key;
    private final double relativePermittivity;
    private final double lossTangent;
    private final double referenceFrequencyHz;
    private final DielectricModelKind defaultModel;
    private final String source;

    DielectricMaterial(String key, double relativePermittivity, double lossTangent, double referenceFrequencyHz,
            DielectricModelKind defaultModel, String source) {
        this.key = key;
        this.relativePermittivity = relativePermittivity;
        this.lossTangent = lossTangent;
        this.referenceFrequencyHz = referenceFrequencyHz;
        this.defaultModel = defaultModel;
        this.source = source;
    }

    /** The name used in design files, e.g. {@code foam-polyethylene}. */
    public String key() {
        return key;
    }

    /** Relative permittivity ε′ at the reference frequency. */
    public double relativePermittivity() {
        return relativePermittivity;
    }

    /** Loss tangent ε″/ε′ at the reference frequency. */
    public double lossTangent() {
        return lossTangent;
    }

    /** Frequency at which the permittivity and loss tangent are stated, Hz. */
    public double referenceFrequencyHz() {
        return referenceFrequencyHz;
    }

    /** The dielectric model used unless the design asks for another. */
    public DielectricModelKind defaultModel() {
        return defaultModel;
    }

    /** Where the nominal values come from. */
    public String source() {
        return source;
    }

    /** Finds a material by its design-file key. */
    public static Optional<DielectricMaterial> byKey(String key) {
        return Arrays.stream(values()).filter(m -> m.key.equals(key)).findFirst();
    }
}
