package org.linesweep.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.linesweep.io.Presets;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.DielectricModelKind;
import org.linesweep.physics.LineType;

/**
 * Sensitivities against closed forms for an ideal coax (lossless conductor and dielectric):
 * Z0 = (η0/2π)·ln(b/a)/sqrt(εr) gives d ln Z0/d ln b = 1/ln(b/a), d ln Z0/d ln a = −1/ln(b/a),
 * d ln Z0/d ln εr = −1/2; the electrical-length ceiling f = T·c/(L·sqrt(εr)) gives d ln f/d ln L = −1 and
 * d ln f/d ln εr = −1/2 (Pozar, table of common lines; telegrapher's equations).
 */
class SensitivityTest {

    /** Five-point differences of a smooth function with h = 1e-3: truncation of order 1e-12. */
    private static final double ELASTICITY_AGREEMENT = 1e-7;

    private static Design idealCoax() {
        return new Design("ideal", "", Geometry.of(LineType.COAX, 1e-3, 3.5e-3, 0.2e-3),
                ConductorSpec.of(ConductorMaterial.PERFECT),
                new DielectricSpec(null, 2.1, 0, 1e9, 0, 1, DielectricModelKind.CONSTANT, 1e3, 1e12), 2.0, 293.15,
                SweepSettings.DEFAULT, 0.01, Double.NaN);
    }

    private static Sensitivity.Row row(List<Sensitivity.Row> rows, String name) {
        return rows.stream().filter(r -> r.input().name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void idealCoaxMatchesTheClosedForms() {
        List<Sensitivity.Row> rows = Sensitivity.analyse(idealCoax(), 1e8, 5, 10, Sensitivity.Quantity.Z0);
        int z0 = Sensitivity.Quantity.Z0.ordinal();
        int ceiling = Sensitivity.Quantity.CEILING.ordinal();
        double lnRatio = Math.log(3.5);
        assertEquals(1 / lnRatio, row(rows, "line.outerDiameter").elasticity()[z0], ELASTICITY_AGREEMENT);
        assertEquals(-1 / lnRatio, row(rows, "line.innerDiameter").elasticity()[z0], ELASTICITY_AGREEMENT);
        assertEquals(-0.5, row(rows, "dielectric.permittivity").elasticity()[z0], ELASTICITY_AGREEMENT);
        assertEquals(0.0, row(rows, "line.outerThickness").elasticity()[z0], ELASTICITY_AGREEMENT);
        assertEquals(-1.0, row(rows, "length").elasticity()[ceiling], 1e-6);
        assertEquals(-0.5, row(rows, "dielectric.permittivity").elasticity()[ceiling], 1e-6);
        // ±5 % of εr: Z0 changes by 1/sqrt(1 ∓ 0.05) − 1 exactly
        Sensitivity.Row permittivity = row(rows, "dielectric.permittivity");
        assertEquals(1 / Math.sqrt(0.95) - 1, permittivity.minus()[z0], 1e-12);
        assertEquals(1 / Math.sqrt(1.05) - 1, permittivity.plus()[z0], 1e-12);
        // ranked by |Z0|: the dimensions (1/ln 3.5 = 0.80) come before εr (0.5), the wall (0) last among them
        assertTrue(rows.get(0).input().name().startsWith("line."));
        assertTrue(rows.indexOf(permittivity) < rows.indexOf(row(rows, "line.outerThickness")));
    }

    @Test
    void lossyDesignsListEveryInput() {
        List<Sensitivity.Row> rows = Sensitivity.analyse(Presets.load("board-trace-50-ohm"), 1e9, 5, 10,
                Sensitivity.Quantity.ATTENUATION);
        List<String> names = rows.stream().map(r -> r.input().name()).toList();
        assertTrue(names.containsAll(List.of("line.width", "line.height", "line.thickness", "dielectric.permittivity",
                "dielectric.lossTangent", "conductor.conductivity", "conductor.roughnessRms", "temperature", "length")),
                names.toString());
        // attenuation per metre of this trace at 1 GHz: tan δ matters, copper conductivity too, length not at all
        assertTrue(row(rows, "dielectric.lossTangent").magnitude(Sensitivity.Quantity.ATTENUATION) > 0.01);
        assertEquals(0.0, row(rows, "length").magnitude(Sensitivity.Quantity.ATTENUATION), 1e-12);
        // hotter copper conducts worse: more loss
        assertTrue(row(rows, "temperature").plus()[Sensitivity.Quantity.ATTENUATION.ordinal()] > 0);
    }

    /**
     * A stripline pair's Zdiff against Cohn's exact formulas: widening the gap raises Zdiff (the odd mode
     * decouples), widening the strips lowers it, and its elasticity matches a direct central difference.
     */
    @Test
    void pairDifferentialImpedance() {
        Design pair = org.linesweep.io.Presets.load("buried-clock-stripline").withGeometryValue("gap", 0.15e-3);
        List<Sensitivity.Row> rows = Sensitivity.analyse(pair, 1e9, 5, 10, Sensitivity.Quantity.DIFFERENTIAL_IMPEDANCE);
        int zdiff = Sensitivity.Quantity.DIFFERENTIAL_IMPEDANCE.ordinal();
        assertTrue(row(rows, "line.gap").plus()[zdiff] > 0);
        assertTrue(row(rows, "line.width").plus()[zdiff] < 0);
        double h = 1e-4;
        double up = pair.withGeometryValue("gap", 0.15e-3 * Math.exp(h)).toPair().modes(1e9).differentialImpedanceOhm();
        double down = pair.withGeometryValue("gap", 0.15e-3 * Math.exp(-h)).toPair().modes(1e9).differentialImpedanceOhm();
        assertEquals((Math.log(up) - Math.log(down)) / (2 * h), row(rows, "line.gap").elasticity()[zdiff], 1e-6);
        // a single line has no Zdiff
        List<Sensitivity.Row> single = Sensitivity.analyse(org.linesweep.io.Presets.load("buried-clock-stripline"), 1e9,
                5, 10, Sensitivity.Quantity.Z0);
        assertTrue(Double.isNaN(single.get(0).plus()[zdiff]));
    }
}
