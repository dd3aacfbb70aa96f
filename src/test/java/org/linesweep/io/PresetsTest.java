package org.linesweep.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.linesweep.design.Design;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineType;
import org.linesweep.sweep.SweepEngine;
import org.linesweep.sweep.SweepResult;

class PresetsTest {

    @Test
    void theListMatchesThePresetsFolder() throws IOException {
        try (var files = Files.list(Path.of("presets"))) {
            Set<String> onDisk = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".json"))
                    .map(n -> n.substring(0, n.length() - 5)).collect(Collectors.toCollection(TreeSet::new));
            assertEquals(onDisk, new TreeSet<>(Presets.NAMES));
        }
        assertTrue(Presets.NAMES.contains(Presets.DEFAULT));
    }

    @Test
    void everyPresetLoadsSweepsAndHasLimits() {
        Set<LineType> types = EnumSet.noneOf(LineType.class);
        for (String name : Presets.NAMES) {
            Design design = Presets.load(name);
            types.add(design.geometry().type());
            assertFalse(design.description().isBlank(), name);
            SweepResult sweep = new SweepEngine().run(design.toModel(), design.sweep().grid(), design.lengthMetres());
            for (int i = 0; i < sweep.size(); i++) {
                assertTrue(Double.isFinite(sweep.z0RealOhm(i)) && sweep.alphaDbPerMetre(i) >= 0, name);
            }
            FrequencyLimits limits = LimitFinder.find(design.toModel(), design.lengthMetres(), design.threshold(),
                    design.lossBudgetDb());
            assertTrue(Double.isFinite(limits.ceilingHz()), name);
        }
        assertEquals(EnumSet.allOf(LineType.class), types, "presets cover every line type");
    }
}
