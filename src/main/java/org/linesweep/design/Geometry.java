package org.linesweep.design;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.linesweep.physics.Conductor;
import org.linesweep.physics.CoaxLine;
import org.linesweep.physics.CoupledPair;
import org.linesweep.physics.Dielectric;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LineType;
import org.linesweep.physics.MicrostripLine;
import org.linesweep.physics.ParallelPlateLine;
import org.linesweep.physics.StriplineLine;
import org.linesweep.physics.TwoWireLine;
import org.linesweep.physics.WireOverGroundLine;

/**
 * A line's type and cross-section, validated: every field of the type present and within its rule, and the
 * relations between them (inner below outer, wires apart, wire above its plane, strip thinner than its
 * spacing) true.
 *
 * @param type the line type
 * @param valuesMetres each geometry field's value in metres, in the order of {@link GeometryField#of}
 */
public record Geometry(LineType type, Map<String, Double> valuesMetres) {

    public Geometry {
        Map<String, Double> ordered = new LinkedHashMap<>();
        for (GeometryField field : GeometryField.of(type)) {
            Double value = valuesMetres.get(field.name());
            if (value == null && field.optional()) {
                continue;
            }
            if (value == null) {
                throw new InvalidInputException("line." + field.name(), null,
                        "a " + type.key() + " line needs " + field.name() + ": " + field.rule().allowed());
            }
            ordered.put(field.name(), field.rule().check("line." + field.name(), value));
        }
        for (String name : valuesMetres.keySet()) {
            if (!ordered.containsKey(name)) {
                throw new InvalidInputException("line." + name, String.valueOf(valuesMetres.get(name)),
                        "a " + type.key() + " line has no such field; its fields are " + ordered.keySet());
            }
        }
        valuesMetres = Collections.unmodifiableMap(ordered);
        checkRelations(type, valuesMetres);
    }

    /** A geometry from values given in the order of {@link GeometryField#of} (optional ones may be left off). */
    public static Geometry of(LineType type, double... valuesMetres) {
        List<GeometryField> fields = GeometryField.of(type);
        long required = fields.stream().filter(field -> !field.optional()).count();
        if (valuesMetres.length < required || valuesMetres.length > fields.size()) {
            throw new IllegalArgumentException(type.key() + " takes " + required + " to " + fields.size() + " values");
        }
        Map<String, Double> map = new LinkedHashMap<>();
        for (int i = 0; i < valuesMetres.length; i++) {
            map.put(fields.get(i).name(), valuesMetres[i]);
        }
        return new Geometry(type, map);
    }

    /**
     * A sensible starting cross-section for a line type, used when the user switches type: roughly 50 Ω
     * for the shielded lines in a common dielectric, everyday sizes for the others.
     */
    public static Geometry starter(LineType type) {
        return switch (type) {
            case COAX -> of(type, 0.9e-3, 2.95e-3, 0.25e-3);
            case TWO_WIRE -> of(type, 0.6e-3, 1.4e-3);
            case WIRE_OVER_GROUND -> of(type, 0.5e-3, 3e-3);
            case PARALLEL_PLATE -> of(type, 60e-3, 0.25e-3, 2e-3);
            case MICROSTRIP -> of(type, 0.38e-3, 0.2e-3, 35e-6);
            case STRIPLINE -> of(type, 0.15e-3, 0.5e-3, 17.5e-6);
        };
    }

    /** The fields this geometry has, in reading order: every required one and the optional ones given. */
    public List<GeometryField> fields() {
        return GeometryField.of(type).stream().filter(field -> valuesMetres.containsKey(field.name())).toList();
    }

    /** True when this is an edge-coupled pair (a microstrip or stripline with a gap). */
    public boolean isPair() {
        return valuesMetres.containsKey(GeometryField.GAP);
    }

    /** This geometry without an optional field (e.g. a pair made single again). */
    public Geometry without(String field) {
        Map<String, Double> map = new LinkedHashMap<>(valuesMetres);
        map.remove(field);
        return new Geometry(type, map);
    }

    /** One field's value, m. */
    public double value(String field) {
        Double value = valuesMetres.get(field);
        if (value == null) {
            throw new IllegalArgumentException(type.key() + " has no field " + field);
        }
        return value;
    }

    /** This geometry with one field changed or an optional one added (validated like any other). */
    public Geometry with(String field, double valueMetres) {
        Map<String, Double> map = new LinkedHashMap<>(valuesMetres);
        boolean known = GeometryField.of(type).stream().anyMatch(f -> f.name().equals(field));
        if (!known) {
            throw new InvalidInputException("line." + field, String.valueOf(valueMetres),
                    "a " + type.key() + " line has no such field; its fields are " + map.keySet());
        }
        map.put(field, valueMetres);
        return new Geometry(type, map);
    }

    private static void checkRelations(LineType type, Map<String, Double> v) {
        switch (type) {
            case COAX -> {
                if (v.get("innerDiameter") >= v.get("outerDiameter")) {
                    throw relation("line.innerDiameter", v.get("innerDiameter"),
                            "it must be smaller than line.outerDiameter (" + metres(v.get("outerDiameter")) + ")");
                }
            }
            case TWO_WIRE -> {
                if (v.get("spacing") <= v.get("wireDiameter")) {
                    throw relation("line.spacing", v.get("spacing"), "the centre spacing must exceed"
                            + " line.wireDiameter (" + metres(v.get("wireDiameter")) + ") or the wires overlap");
                }
            }
            case WIRE_OVER_GROUND -> {
                if (v.get("height") <= v.get("wireDiameter") / 2) {
                    throw relation("line.height", v.get("height"), "the centre height must exceed the wire's radius ("
                            + metres(v.get("wireDiameter") / 2) + ") or the wire touches the ground plane");
                }
            }
            case STRIPLINE -> {
                if (v.get("thickness") >= v.get("spacing")) {
                    throw relation("line.thickness", v.get("thickness"),
                            "the strip must be thinner than line.spacing (" + metres(v.get("spacing")) + ")");
                }
            }
            default -> {
            }
        }
    }

    private static InvalidInputException relation(String field, double value, String allowed) {
        return new InvalidInputException(field, metres(value), allowed);
    }

    private static String metres(double value) {
        return Units.engineering(value, "m", 4);
    }

    /** The coupled pair this geometry describes, or null when it is a single line. */
    public CoupledPair toPair(Dielectric dielectric) {
        if (!isPair()) {
            return null;
        }
        List<GeometryField> fields = GeometryField.of(type);
        return new CoupledPair(type, value(fields.get(0).name()), value(fields.get(1).name()),
                value(fields.get(2).name()), value(GeometryField.GAP), dielectric);
    }

    /** Builds the physics model of this geometry: for a pair, the model of one of its strips alone. */
    public LineModel toModel(Conductor conductor, Dielectric dielectric) {
        List<GeometryField> fields = GeometryField.of(type);
        double a = value(fields.get(0).name());
        double b = value(fields.get(1).name());
        double c = fields.size() > 2 && !fields.get(2).optional() ? value(fields.get(2).name()) : 0.0;
        return switch (type) {
            case COAX -> new CoaxLine(a, b, c, conductor, dielectric);
            case TWO_WIRE -> new TwoWireLine(a, b, conductor, dielectric);
            case WIRE_OVER_GROUND -> new WireOverGroundLine(a, b, conductor, dielectric);
            case PARALLEL_PLATE -> new ParallelPlateLine(a, b, c, conductor, dielectric);
            case MICROSTRIP -> new MicrostripLine(a, b, c, conductor, dielectric);
            case STRIPLINE -> new StriplineLine(a, b, c, conductor, dielectric);
        };
    }
}
