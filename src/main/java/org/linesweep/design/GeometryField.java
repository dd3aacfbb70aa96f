package org.linesweep.design;

import java.util.List;
import org.linesweep.physics.LineType;

/**
 * One geometry parameter of a line type: its design-file name, a label for people, and its rule.
 *
 * @param name design-file name, e.g. {@code innerDiameter}
 * @param label for people, e.g. "Inner conductor diameter"
 * @param rule the rule its values obey
 * @param optional true for a field a design may leave out (the pair's gap)
 */
public record GeometryField(String name, String label, Rule rule, boolean optional) {

    /** Name of the optional field that makes a microstrip or stripline an edge-coupled pair. */
    public static final String GAP = "gap";

    /** A field every design of its type has. */
    public GeometryField(String name, String label, Rule rule) {
        this(name, label, rule, false);
    }

    /** True when a line type can be an edge-coupled pair (it has the optional gap). */
    public static boolean pairable(LineType type) {
        return of(type).stream().anyMatch(field -> field.name().equals(GAP));
    }

    /** The geometry fields of a line type, in the order a person reads them; optional ones last. */
    public static List<GeometryField> of(LineType type) {
        return switch (type) {
            case COAX -> List.of(
                    new GeometryField("innerDiameter", "Inner conductor diameter", Rule.DIMENSION),
                    new GeometryField("outerDiameter", "Outer conductor inside diameter", Rule.DIMENSION),
                    new GeometryField("outerThickness", "Outer conductor wall", Rule.THICKNESS));
            case TWO_WIRE -> List.of(
                    new GeometryField("wireDiameter", "Wire diameter", Rule.DIMENSION),
                    new GeometryField("spacing", "Centre spacing", Rule.DIMENSION));
            case WIRE_OVER_GROUND -> List.of(
                    new GeometryField("wireDiameter", "Wire diameter", Rule.DIMENSION),
                    new GeometryField("height", "Height of wire centre", Rule.DIMENSION));
            case PARALLEL_PLATE -> List.of(
                    new GeometryField("width", "Plate width", Rule.DIMENSION),
                    new GeometryField("separation", "Plate separation", Rule.DIMENSION),
                    new GeometryField("thickness", "Plate thickness", Rule.THICKNESS));
            case MICROSTRIP -> List.of(
                    new GeometryField("width", "Strip width", Rule.DIMENSION),
                    new GeometryField("height", "Substrate height", Rule.DIMENSION),
                    new GeometryField("thickness", "Strip thickness", Rule.THICKNESS),
                    new GeometryField(GAP, "Gap to twin strip (pair)", Rule.DIMENSION, true));
            case STRIPLINE -> List.of(
                    new GeometryField("width", "Strip width", Rule.DIMENSION),
                    new GeometryField("spacing", "Ground-plane spacing", Rule.DIMENSION),
                    new GeometryField("thickness", "Strip thickness", Rule.THICKNESS),
                    new GeometryField(GAP, "Gap to twin strip (pair)", Rule.DIMENSION, true));
        };
    }
}
