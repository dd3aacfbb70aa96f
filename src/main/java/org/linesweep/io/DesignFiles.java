package org.linesweep.io;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.linesweep.design.ConductorSpec;
import org.linesweep.design.Design;
import org.linesweep.design.DielectricSpec;
import org.linesweep.design.Geometry;
import org.linesweep.design.GeometryField;
import org.linesweep.design.InvalidInputException;
import org.linesweep.design.Rule;
import org.linesweep.design.SweepSettings;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.Dielectric;
import org.linesweep.physics.DielectricMaterial;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineType;
import org.linesweep.sweep.GridScale;

/**
 * Reads and writes design files: JSON, with a format version. Quantities are plain numbers in SI base units
 * or strings with a unit ("0.82 mm", "2.4 GHz", "20 degC"). Every problem is reported as an
 * {@link InvalidInputException} naming the field by its path (e.g. {@code line.innerDiameter}); a file is
 * read whole or not at all.
 */
public final class DesignFiles {

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .enable(SerializationFeature.INDENT_OUTPUT);

    private static final Set<String> TOP_FIELDS = Set.of("formatVersion", "name", "description", "line",
            "conductor", "dielectric", "length", "temperature", "sweep", "threshold", "lossBudget");
    private static final Set<String> CONDUCTOR_FIELDS = Set.of("material", "conductivity", "permeability",
            "temperatureCoefficient", "roughnessRms");
    private static final Set<String> DIELECTRIC_FIELDS = Set.of("material", "permittivity", "lossTangent",
            "referenceFrequency", "conductivity", "permeability", "model", "bandLowHz", "bandHighHz");
    private static final Set<String> SWEEP_FIELDS = Set.of("from", "to", "points", "scale");

    /** Default reference frequency of a raw dielectric: 1 GHz. */
    public static final double DEFAULT_REFERENCE_FREQUENCY_HZ = 1e9;

    private DesignFiles() {
    }

    /** Reads a design file. */
    public static Design read(Path path) {
        String text;
        try {
            text = Files.readString(path, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            throw new InvalidInputException("file", path.toString(), "the file cannot be read ("
                    + describe(e) + ")");
        }
        return parse(text);
    }

    /** Parses a design from JSON text. */
    public static Design parse(String json) {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? ""
                    : " at line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr();
            throw new InvalidInputException("file", "(JSON)", "the file is not valid JSON" + where + ": "
                    + e.getOriginalMessage());
        }
        if (root == null || !root.isObject()) {
            throw new InvalidInputException("file", "(JSON)", "a design file holds one JSON object");
        }
        checkFields(root, "", TOP_FIELDS);
        int version = 1;
        if (root.has("formatVersion")) {
            JsonNode v = root.get("formatVersion");
            if (!v.isIntegralNumber()) {
                throw new InvalidInputException("formatVersion", v.toString(), "expected a whole number such as 1");
            }
            version = v.intValue();
            if (version > Design.FORMAT_VERSION) {
                throw new InvalidInputException("formatVersion", v.toString(), "this file was written by a newer"
                        + " LineSweep (format " + version + "); this one reads up to format " + Design.FORMAT_VERSION);
            }
            if (version < 1) {
                throw new InvalidInputException("formatVersion", v.toString(), "format versions start at 1");
            }
        }
        Geometry geometry = readGeometry(required(root, "line", ""));
        ConductorSpec conductor = readConductor(required(root, "conductor", ""));
        DielectricSpec dielectric = readDielectric(required(root, "dielectric", ""));
        double length = quantity(required(root, "length", ""), "length", Rule.LINE_LENGTH);
        double temperature = root.has("temperature")
                ? quantity(root.get("temperature"), "temperature", Rule.TEMPERATURE) : Design.DEFAULT_TEMPERATURE_KELVIN;
        SweepSettings sweep = root.has("sweep") ? readSweep(root.get("sweep")) : SweepSettings.DEFAULT;
        double threshold = root.has("threshold")
                ? quantity(root.get("threshold"), "threshold", Rule.THRESHOLD) : LimitFinder.DEFAULT_THRESHOLD;
        double lossBudget = root.has("lossBudget") && !root.get("lossBudget").isNull()
                ? quantity(root.get("lossBudget"), "lossBudget", Rule.LOSS_BUDGET) : Double.NaN;
        return new Design(text(root, "name"), text(root, "description"), geometry, conductor, dielectric, length,
                temperature, sweep, threshold, lossBudget);
    }

    private static Geometry readGeometry(JsonNode line) {
        requireObject(line, "line");
        JsonNode typeNode = required(line, "type", "line.");
        LineType type = LineType.byKey(typeNode.asText()).orElseThrow(() -> new InvalidInputException("line.type",
                typeNode.asText(), "expected one of " + keys(LineType.values())));
        Set<String> allowed = new TreeSet<>();
        allowed.add("type");
        Map<String, Double> values = new LinkedHashMap<>();
        for (GeometryField field : GeometryField.of(type)) {
            allowed.add(field.name());
        }
        checkFields(line, "line.", allowed);
        for (GeometryField field : GeometryField.of(type)) {
            String path = "line." + field.name();
            if (field.optional() && !line.has(field.name())) {
                continue;
            }
            values.put(field.name(), quantity(required(line, field.name(), "line."), path, field.rule()));
        }
        return new Geometry(type, values);
    }

    private static ConductorSpec readConductor(JsonNode node) {
        requireObject(node, "conductor");
        checkFields(node, "conductor.", CONDUCTOR_FIELDS);
        String material = null;
        double conductivity;
        double coefficient = 0.0;
        double permeability = 1.0;
        if (node.has("material")) {
            String key = node.get("material").asText();
            ConductorMaterial m = ConductorMaterial.byKey(key).orElseThrow(() -> new InvalidInputException(
                    "conductor.material", key, "expected one of " + keys(ConductorMaterial.values())
                            + " or raw values (conductivity, permeability)"));
            material = m.key();
            conductivity = m.conductivitySiemensPerMetre();
            coefficient = m.temperatureCoefficientPerKelvin();
            permeability = m.relativePermeability();
            if (m == ConductorMaterial.PERFECT && node.has("conductivity")) {
                throw new InvalidInputException("conductor.conductivity", node.get("conductivity").asText(),
                        "a perfect conductor has no conductivity to give; remove the field or the material");
            }
        } else {
            conductivity = quantity(required(node, "conductivity", "conductor."), "conductor.conductivity",
                    Rule.CONDUCTIVITY);
        }
        if (node.has("conductivity")) {
            conductivity = quantity(node.get("conductivity"), "conductor.conductivity", Rule.CONDUCTIVITY);
        }
        if (node.has("temperatureCoefficient")) {
            coefficient = quantity(node.get("temperatureCoefficient"), "conductor.temperatureCoefficient",
                    Rule.TEMPERATURE_COEFFICIENT);
        }
        if (node.has("permeability")) {
            permeability = quantity(node.get("permeability"), "conductor.permeability", Rule.PERMEABILITY);
        }
        double roughness = node.has("roughnessRms")
                ? quantity(node.get("roughnessRms"), "conductor.roughnessRms", Rule.ROUGHNESS) : 0.0;
        return new ConductorSpec(material, conductivity, coefficient, permeability, roughness);
    }

    private static DielectricSpec readDielectric(JsonNode node) {
        requireObject(node, "dielectric");
        checkFields(node, "dielectric.", DIELECTRIC_FIELDS);
        String material = null;
        double permittivity;
        double lossTangent = 0.0;
        double reference = DEFAULT_REFERENCE_FREQUENCY_HZ;
        DielectricModelKind model = DielectricModelKind.CONSTANT;
        if (node.has("material")) {
            String key = node.get("material").asText();
            DielectricMaterial m = DielectricMaterial.byKey(key).orElseThrow(() -> new InvalidInputException(
                    "dielectric.material", key, "expected one of " + keys(DielectricMaterial.values())
                            + " or raw values (permittivity, lossTangent)"));
            material = m.key();
            permittivity = m.relativePermittivity();
            lossTangent = m.lossTangent();
            reference = m.referenceFrequencyHz();
            model = m.defaultModel();
        } else {
            permittivity = quantity(required(node, "permittivity", "dielectric."), "dielectric.permittivity",
                    Rule.PERMITTIVITY);
        }
        if (node.has("permittivity")) {
            permittivity = quantity(node.get("permittivity"), "dielectric.permittivity", Rule.PERMITTIVITY);
        }
        if (node.has("lossTangent")) {
            lossTangent = quantity(node.get("lossTangent"), "dielectric.lossTangent", Rule.LOSS_TANGENT);
        }
        if (node.has("referenceFrequency")) {
            reference = quantity(node.get("referenceFrequency"), "dielectric.referenceFrequency", Rule.FREQUENCY);
        }
        if (node.has("model")) {
            String key = node.get("model").asText();
            model = DielectricModelKind.byKey(key).orElseThrow(() -> new InvalidInputException("dielectric.model",
                    key, "expected one of " + keys(DielectricModelKind.values())));
        }
        double conductivity = node.has("conductivity")
                ? quantity(node.get("conductivity"), "dielectric.conductivity", Rule.DIELECTRIC_CONDUCTIVITY) : 0.0;
        double permeability = node.has("permeability")
                ? quantity(node.get("permeability"), "dielectric.permeability", Rule.PERMEABILITY) : 1.0;
        double bandLow = node.has("bandLowHz")
                ? quantity(node.get("bandLowHz"), "dielectric.bandLowHz", Rule.BAND_EDGE) : Dielectric.DEFAULT_BAND_LOW_HZ;
        double bandHigh = node.has("bandHighHz")
                ? quantity(node.get("bandHighHz"), "dielectric.bandHighHz", Rule.BAND_EDGE)
                : Dielectric.DEFAULT_BAND_HIGH_HZ;
        return new DielectricSpec(material, permittivity, lossTangent, reference, conductivity, permeability, model,
                bandLow, bandHigh);
    }

    private static SweepSettings readSweep(JsonNode node) {
        requireObject(node, "sweep");
        checkFields(node, "sweep.", SWEEP_FIELDS);
        SweepSettings d = SweepSettings.DEFAULT;
        double from = node.has("from") ? quantity(node.get("from"), "sweep.from", Rule.FREQUENCY) : d.fromHz();
        double to = node.has("to") ? quantity(node.get("to"), "sweep.to", Rule.FREQUENCY) : d.toHz();
        int points = node.has("points") ? (int) quantity(node.get("points"), "sweep.points", Rule.POINTS) : d.points();
        GridScale scale = d.scale();
        if (node.has("scale")) {
            String key = node.get("scale").asText();
            scale = GridScale.byKey(key).orElseThrow(() -> new InvalidInputException("sweep.scale", key,
                    "expected \"log\" or \"lin\""));
        }
        return new SweepSettings(from, to, points, scale);
    }

    /** A quantity field: a number in SI base units or a string with a unit, checked against its rule. */
    static double quantity(JsonNode node, String path, Rule rule) {
        if (node.isNumber()) {
            return rule.check(path, node.doubleValue());
        }
        if (node.isTextual()) {
            return rule.parse(path, node.textValue());
        }
        throw new InvalidInputException(path, node.toString(), "expected " + rule.kind().example());
    }

    private static JsonNode required(JsonNode parent, String name, String prefix) {
        JsonNode node = parent.get(name);
        if (node == null || node.isNull()) {
            throw new InvalidInputException(prefix + name, null, "this field is required");
        }
        return node;
    }

    private static void requireObject(JsonNode node, String path) {
        if (!node.isObject()) {
            throw new InvalidInputException(path, node.toString(), "expected a JSON object { ... }");
        }
    }

    private static String text(JsonNode root, String name) {
        JsonNode node = root.get(name);
        if (node == null || node.isNull()) {
            return "";
        }
        if (!node.isTextual()) {
            throw new InvalidInputException(name, node.toString(), "expected a string");
        }
        return node.textValue();
    }

    private static void checkFields(JsonNode node, String prefix, Set<String> allowed) {
        Iterator<String> names = node.fieldNames();
        while (names.hasNext()) {
            String name = names.next();
            if (!allowed.contains(name)) {
                String hint = nearest(name, allowed);
                throw new InvalidInputException(prefix + name, node.get(name).toString(), "unknown field"
                        + (hint == null ? "" : "; did you mean '" + hint + "'?") + " Known fields here: "
                        + new TreeSet<>(allowed));
            }
        }
    }

    /** The allowed name closest to a misspelt one (edit distance ≤ 3 or equal ignoring case), or null. */
    static String nearest(String name, Set<String> allowed) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : allowed) {
            int distance = candidate.equalsIgnoreCase(name) ? 0
                    : editDistance(name.toLowerCase(), candidate.toLowerCase());
            if (distance < bestDistance) {
                bestDistance = distance;
                best = candidate;
            }
        }
        return bestDistance <= Math.max(2, Math.min(3, name.length() / 3)) ? best : null;
    }

    private static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }

    private static String keys(Enum<?>[] values) {
        List<String> keys = new ArrayList<>();
        for (Enum<?> value : values) {
            try {
                keys.add((String) value.getClass().getMethod("key").invoke(value));
            } catch (ReflectiveOperationException e) {
                keys.add(value.name());
            }
        }
        return String.join(", ", keys);
    }

    private static String describe(Exception e) {
        return e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase() + (e.getMessage() == null ? "" : ": " + e.getMessage());
    }

    /** The design as a JSON tree, every quantity in SI base units. */
    public static ObjectNode toTree(Design design) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("formatVersion", Design.FORMAT_VERSION);
        root.put("name", design.name());
        root.put("description", design.description());
        ObjectNode line = root.putObject("line");
        line.put("type", design.geometry().type().key());
        design.geometry().valuesMetres().forEach(line::put);
        ObjectNode conductor = root.putObject("conductor");
        ConductorSpec c = design.conductor();
        if (c.materialKey() != null) {
            conductor.put("material", c.materialKey());
        }
        if (!c.isPerfect()) {
            conductor.put("conductivity", c.conductivitySiemensPerMetre());
            conductor.put("temperatureCoefficient", c.temperatureCoefficientPerKelvin());
            conductor.put("permeability", c.relativePermeability());
        }
        conductor.put("roughnessRms", c.roughnessRmsMetres());
        ObjectNode dielectric = root.putObject("dielectric");
        DielectricSpec d = design.dielectric();
        if (d.materialKey() != null) {
            dielectric.put("material", d.materialKey());
        }
        dielectric.put("permittivity", d.relativePermittivity());
        dielectric.put("lossTangent", d.lossTangent());
        dielectric.put("referenceFrequency", d.referenceFrequencyHz());
        dielectric.put("conductivity", d.conductivitySiemensPerMetre());
        dielectric.put("permeability", d.relativePermeability());
        dielectric.put("model", d.model().key());
        dielectric.put("bandLowHz", d.bandLowHz());
        dielectric.put("bandHighHz", d.bandHighHz());
        root.put("length", design.lengthMetres());
        root.put("temperature", design.temperatureKelvin());
        ObjectNode sweep = root.putObject("sweep");
        sweep.put("from", design.sweep().fromHz());
        sweep.put("to", design.sweep().toHz());
        sweep.put("points", design.sweep().points());
        sweep.put("scale", design.sweep().scale().key());
        root.put("threshold", design.threshold());
        if (!Double.isNaN(design.lossBudgetDb())) {
            root.put("lossBudget", design.lossBudgetDb());
        }
        return root;
    }

    /** The design as JSON text. */
    public static String toJson(Design design) {
        try {
            return MAPPER.writeValueAsString(toTree(design)) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a design tree always serialises", e);
        }
    }

    /** Writes a design file atomically: on failure the old file is left intact. */
    public static void write(Design design, Path path) throws IOException {
        AtomicFiles.write(path, toJson(design).getBytes(StandardCharsets.UTF_8));
    }

    /** The shared mapper, configured for strict reading and indented writing. */
    public static ObjectMapper mapper() {
        return MAPPER;
    }
}
