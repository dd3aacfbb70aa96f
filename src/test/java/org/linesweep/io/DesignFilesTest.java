package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.linesweep.design.Design;
import org.linesweep.design.InvalidInputException;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineType;

class DesignFilesTest {

    private static final String MINIMAL = """
            { "line": { "type": "coax", "innerDiameter": "0.9 mm", "outerDiameter": "2.95 mm", "outerThickness": "0.25 mm" },
              "conductor": { "material": "copper" }, "dielectric": { "material": "ptfe" }, "length": "1.5 m" }
            """;

    @Test
    void readsAMinimalDesignWithDocumentedDefaults() {
        Design d = DesignFiles.parse(MINIMAL);
        assertEquals(LineType.COAX, d.geometry().type());
        assertEquals(0.9e-3, d.geometry().value("innerDiameter"), 1e-18);
        assertEquals(293.15, d.temperatureKelvin(), 1e-12);
        assertEquals(0.01, d.threshold());
        assertEquals(401, d.sweep().points());
        assertTrue(Double.isNaN(d.lossBudgetDb()));
    }

    @Test
    void roundTripsThroughJson(@TempDir Path dir) throws IOException {
        Design d = DesignFiles.parse(MINIMAL.replace("\"length\": \"1.5 m\"",
                "\"length\": \"1.5 m\", \"lossBudget\": \"3 dB\", \"temperature\": \"40 degC\""));
        Path file = dir.resolve("d.json");
        DesignFiles.write(d, file);
        assertEquals(d, DesignFiles.read(file));
        try (var files = Files.list(dir)) {
            assertEquals(List.of(file), files.collect(Collectors.toList()), "no temporary file left behind");
        }
    }

    @Test
    void rawMaterials() {
        Design d = DesignFiles.parse(MINIMAL.replace("{ \"material\": \"copper\" }",
                "{ \"conductivity\": \"40 MS/m\", \"permeability\": 1 }").replace("{ \"material\": \"ptfe\" }",
                "{ \"permittivity\": 3.7, \"lossTangent\": 0.01, \"referenceFrequency\": \"1 GHz\","
                        + " \"model\": \"wideband-debye\", \"bandLowHz\": 1000, \"bandHighHz\": 1e12 }"));
        assertEquals(4e7, d.conductor().conductivitySiemensPerMetre(), 1e-3);
        assertEquals(DielectricModelKind.WIDEBAND_DEBYE, d.dielectric().model());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"innerDiameter\": \"0.9 mm\"|\"innerDiameter\": \"3 mm\"|line.innerDiameter",
        "\"innerDiameter\": \"0.9 mm\"|\"innerDiameter\": \"-1 mm\"|line.innerDiameter",
        "\"innerDiameter\": \"0.9 mm\"|\"innerDiameter\": \"NaN\"|line.innerDiameter",
        "\"innerDiameter\": \"0.9 mm\"|\"innerDiamter\": \"0.9 mm\"|line.innerDiamter",
        "\"material\": \"copper\"|\"material\": \"unobtainium\"|conductor.material",
        "\"length\": \"1.5 m\"|\"length\": \"1.5 parsec\"|length",
        "\"length\": \"1.5 m\"|\"lenght\": \"1.5 m\"|lenght",
        "\"type\": \"coax\"|\"type\": \"waveguide\"|line.type",
        "\"length\": \"1.5 m\"|\"length\": \"1.5 m\", \"formatVersion\": 99|formatVersion",
        "\"length\": \"1.5 m\"|\"length\": \"1.5 m\", \"sweep\": {\"from\": \"2 GHz\", \"to\": \"1 GHz\"}|sweep.from",
        "\"length\": \"1.5 m\"|\"length\": \"1.5 m\", \"length\": \"2 m\"|file"
    })
    void badInputNamesTheField(String from, String to, String field) {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> DesignFiles.parse(MINIMAL.replace(from, to)));
        assertEquals(field, e.field(), e.getMessage());
        assertTrue(e.getMessage().startsWith(field + ":"), e.getMessage());
    }

    @Test
    void misspeltFieldGetsAHint() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> DesignFiles.parse(MINIMAL.replace("\"innerDiameter\"", "\"innerDiamter\"")));
        assertTrue(e.getMessage().contains("did you mean 'innerDiameter'"), e.getMessage());
    }

    @Test
    void newerFormatIsRefusedNotHalfRead() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> DesignFiles.parse(MINIMAL.replace("{ \"line\"", "{ \"formatVersion\": 2, \"line\"")));
        assertTrue(e.getMessage().contains("newer"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "two-wire|\"wireDiameter\": \"1 mm\", \"spacing\": \"0.9 mm\"|line.spacing",
        "wire-over-ground|\"wireDiameter\": \"1 mm\", \"height\": \"0.5 mm\"|line.height",
        "stripline|\"width\": \"1 mm\", \"spacing\": \"0.5 mm\", \"thickness\": \"0.5 mm\"|line.thickness",
        "microstrip|\"width\": \"1 mm\", \"height\": \"0.5 mm\"|line.thickness"
    })
    void geometryRelations(String type, String fields, String field) {
        String json = "{ \"line\": { \"type\": \"" + type + "\", " + fields + " }, \"conductor\": { \"material\":"
                + " \"copper\" }, \"dielectric\": { \"material\": \"air\" }, \"length\": 1 }";
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> DesignFiles.parse(json));
        assertEquals(field, e.field(), e.getMessage());
    }

    @Test
    void malformedAndMissingFiles(@TempDir Path dir) throws IOException {
        Path broken = dir.resolve("broken.json");
        Files.writeString(broken, "{ \"line\": ");
        InvalidInputException malformed = assertThrows(InvalidInputException.class, () -> DesignFiles.read(broken));
        assertTrue(malformed.getMessage().contains("not valid JSON"), malformed.getMessage());
        InvalidInputException missing = assertThrows(InvalidInputException.class,
                () -> DesignFiles.read(dir.resolve("absent.json")));
        assertTrue(missing.getMessage().contains("cannot be read"), missing.getMessage());
    }

    @Test
    void failedSaveLeavesTheOldFileIntact(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("keep.json");
        Files.writeString(file, "old content");
        assertThrows(IOException.class, () -> AtomicFiles.write(file, out -> {
            out.write("half of the new".getBytes());
            throw new IOException("disk full (simulated)");
        }));
        assertEquals("old content", Files.readString(file));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count());
        }
    }

    @Test
    void pairGapIsOptionalAndOnlyForStrips() {
        String pair = """
                { "line": { "type": "stripline", "width": "0.15 mm", "spacing": "0.5 mm", "thickness": "17.5 um",
                            "gap": "6 mil" },
                  "conductor": { "material": "copper" }, "dielectric": { "material": "epoxy-glass" }, "length": "0.2 m" }
                """;
        Design d = DesignFiles.parse(pair);
        assertTrue(d.geometry().isPair());
        assertEquals(6 * 25.4e-6, d.geometry().value("gap"), 1e-15);
        Design back = DesignFiles.parse(DesignFiles.toJson(d));
        assertEquals(d.geometry(), back.geometry());
        assertTrue(!DesignFiles.parse(pair.replaceAll(",\\s*\"gap\": \"6 mil\"", "")).geometry().isPair());
        InvalidInputException onCoax = assertThrows(InvalidInputException.class,
                () -> DesignFiles.parse(MINIMAL.replace("\"outerThickness\": \"0.25 mm\"",
                        "\"outerThickness\": \"0.25 mm\", \"gap\": \"1 mm\"")));
        assertTrue(onCoax.getMessage().contains("line.gap"), onCoax.getMessage());
        InvalidInputException negative = assertThrows(InvalidInputException.class,
                () -> DesignFiles.parse(pair.replace("6 mil", "-6 mil")));
        assertTrue(negative.getMessage().startsWith("line.gap"), negative.getMessage());
    }
}
