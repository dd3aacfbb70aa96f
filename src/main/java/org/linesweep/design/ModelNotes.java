package org.linesweep.design;

import java.util.ArrayList;
import java.util.List;
import org.linesweep.physics.LineType;

/**
 * What the window's help, the review pack and the command line say about the models and about safety: one
 * wording, kept here.
 */
public final class ModelNotes {

    /** The cautions every report carries. */
    public static final List<String> CAUTIONS = List.of(
            "LineSweep's results are estimates from closed-form models of idealised geometry. They are not a"
                    + " substitute for measurement, or for a field solver where the design is critical.",
            "High voltage, RF exposure and mains wiring can hurt or kill. Nothing here says whether a cable, bus bar"
                    + " or board is safe for a voltage, a current or a transmitted power: power handling, insulation,"
                    + " creepage and clearance, heating and exposure limits are your responsibility.",
            "Follow your local electrical codes, RF-exposure rules and licensed practice; where they apply, the work"
                    + " belongs to a qualified, licensed person.");

    private ModelNotes() {
    }

    /** The model of one line type, its source and its stated validity. */
    public static String lineModel(LineType type) {
        return switch (type) {
            case COAX -> "Coax: F = 2π/ln(b/a); exact round-wire (Bessel) inner and exact tube outer conductor"
                    + " (Schelkunoff 1934); TE11 from the exact Bessel cross-product root.";
            case TWO_WIRE -> "Two-wire: acosh form (exact for ideal geometry) with the proximity factor faded in with"
                    + " the skin effect; the line radiates when the spacing nears λ/10 (not modelled).";
            case WIRE_OVER_GROUND -> "Wire over ground: image theory, acosh form (exact for an ideal infinite plane)"
                    + " with the proximity factor; the line radiates when twice the height nears λ/10 (not modelled).";
            case PARALLEL_PLATE -> "Parallel plate: w/d, fringing neglected (flagged below w/d = 10).";
            case MICROSTRIP -> "Microstrip: Hammerstad-Jensen 1980 static Z0 and ε_eff (0.01 ≤ w/h ≤ 100),"
                    + " Kirschning-Jansen 1982 dispersion (0.1 ≤ w/h, εr ≤ 20, h/λ0 ≤ 0.13); conductor loss by"
                    + " Wheeler's incremental-inductance rule.";
            case STRIPLINE -> "Stripline: Cohn 1954 exact zero-thickness Z0 with Wheeler 1978 thickness ratio"
                    + " (0.5 % for W′/(b − t) < 10).";
        };
    }

    /** Notes that apply to every line. */
    public static final List<String> COMMON = List.of(
            "Conductors: exact finite-thickness surface impedance for flat conductors; Hammerstad roughness factor"
                    + " (not causal).",
            "Dielectrics: constant loss tangent (not causal) or wideband Debye (Djordjevic-Sarkar 2001, causal).",
            "Everything is quasi-TEM: above the first higher-order mode the results do not hold.");

    /** The pair models. */
    public static final String PAIRS = "Pairs: Cohn 1955 exact zero-thickness coupled stripline; Kirschning-Jansen"
            + " 1984 static coupled microstrip (0.1 ≤ w/h ≤ 10, 0.1 ≤ s/h ≤ 10, εr ≤ 18); thickness as the single"
            + " line's ratio; the modes' own dispersion is not modelled.";

    /** The time-domain and two-port methods. */
    public static final String SIGNALS = "Waveforms: exact terminated two-port in the frequency domain, Gaussian"
            + " edges, inverse FFT; causal only with a causal dielectric and smooth conductors. Touchstone: S-parameters"
            + " of the line alone against the chosen reference impedance.";

    /** Every note for a line type, in reading order. */
    public static List<String> forType(LineType type, boolean pair) {
        List<String> notes = new ArrayList<>();
        notes.add(lineModel(type));
        if (pair) {
            notes.add(PAIRS);
        }
        notes.addAll(COMMON);
        notes.add(SIGNALS);
        return notes;
    }

    /** Every note, for the help window. */
    public static List<String> all() {
        List<String> notes = new ArrayList<>();
        for (LineType type : LineType.values()) {
            notes.add(lineModel(type));
        }
        notes.add(PAIRS);
        notes.addAll(COMMON);
        notes.add(SIGNALS);
        return notes;
    }
}
