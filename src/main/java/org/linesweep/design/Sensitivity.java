package org.linesweep.design;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.function.ToDoubleFunction;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.apache.commons.math3.analysis.differentiation.FiniteDifferencesDifferentiator;
import org.apache.commons.math3.analysis.differentiation.UnivariateDifferentiableFunction;
import org.linesweep.physics.FrequencyLimits;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.LinePoint;

/**
 * How much |Z0|, attenuation, phase velocity, the frequency ceiling and a pair's differential impedance move
 * when each input moves: the
 * change for −x % and +x % of the input (temperature: ∓ and ± kelvin), both shown because the response need
 * not be symmetric, and the local elasticity d ln Q / d ln X (per kelvin, relative, for temperature) from
 * Commons Math's five-point finite-difference differentiator on ln X with a step of 1e-3 (truncation of order
 * h⁴ ≈ 1e-12, far below the rounding of the root-found ceiling).
 */
public final class Sensitivity {

    /** The quantities watched. */
    public enum Quantity {
        Z0("|Z0|"), ATTENUATION("attenuation"), PHASE_VELOCITY("phase velocity"), CEILING("ceiling"),
        /** Differential impedance of a pair; NaN for a single line. */
        DIFFERENTIAL_IMPEDANCE("Zdiff");

        private final String label;

        Quantity(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * An input that can be varied.
     *
     * @param name design-file path, e.g. {@code line.width}
     * @param label for people
     * @param kelvin true when it is varied in kelvin rather than in per cent
     */
    public record Input(String name, String label, boolean kelvin, ToDoubleFunction<Design> get,
            BiFunction<Design, Double, Design> set) {
    }

    /**
     * One input's effect. Arrays are indexed by {@link Quantity#ordinal()}; changes are relative (0.01 = 1 %),
     * NaN where the quantity does not exist (no ceiling).
     */
    public record Row(Input input, double[] minus, double[] plus, double[] elasticity) {
        /** The larger of the two changes in a quantity, for ranking. */
        public double magnitude(Quantity q) {
            double m = Math.max(Math.abs(minus[q.ordinal()]), Math.abs(plus[q.ordinal()]));
            return Double.isNaN(m) ? -1 : m;
        }
    }

    private static final double LOG_STEP = 1e-3;

    private Sensitivity() {
    }

    /** The inputs of a design that can be varied. */
    public static List<Input> inputs(Design design) {
        List<Input> inputs = new ArrayList<>();
        for (GeometryField field : design.geometry().fields()) {
            inputs.add(new Input("line." + field.name(), field.label(), false,
                    d -> d.geometry().value(field.name()), (d, v) -> d.withGeometryValue(field.name(), v)));
        }
        inputs.add(new Input("dielectric.permittivity", "Permittivity εr", false,
                d -> d.dielectric().relativePermittivity(),
                (d, v) -> d.withDielectric(d.dielectric().withValues(v, d.dielectric().lossTangent(),
                        d.dielectric().model()))));
        if (design.dielectric().lossTangent() > 0) {
            inputs.add(new Input("dielectric.lossTangent", "Loss tangent", false, d -> d.dielectric().lossTangent(),
                    (d, v) -> d.withDielectric(d.dielectric().withValues(d.dielectric().relativePermittivity(), v,
                            d.dielectric().model()))));
        }
        if (!design.conductor().isPerfect()) {
            inputs.add(new Input("conductor.conductivity", "Conductivity", false,
                    d -> d.conductor().conductivitySiemensPerMetre(),
                    (d, v) -> d.withConductor(d.conductor().withValues(v, d.conductor().relativePermeability()))));
            if (design.conductor().roughnessRmsMetres() > 0) {
                inputs.add(new Input("conductor.roughnessRms", "Roughness", false,
                        d -> d.conductor().roughnessRmsMetres(), (d, v) -> d.withConductor(d.conductor().withRoughness(v))));
            }
            inputs.add(new Input("temperature", "Temperature", true, Design::temperatureKelvin, Design::withTemperature));
        }
        inputs.add(new Input("length", "Line length", false, Design::lengthMetres, Design::withLength));
        return inputs;
    }

    /**
     * Analyses every input at a frequency.
     *
     * @param percent relative step for the ± columns, in per cent (e.g. 5)
     * @param kelvin step for temperature, K
     * @param rankBy the quantity the rows are ranked by, largest effect first
     */
    public static List<Row> analyse(Design design, double frequencyHz, double percent, double kelvin, Quantity rankBy) {
        double[] base = quantities(design, frequencyHz);
        List<Row> rows = new ArrayList<>();
        for (Input input : inputs(design)) {
            double x0 = input.get().applyAsDouble(design);
            Map<Double, double[]> memo = new HashMap<>();
            java.util.function.DoubleFunction<double[]> at = x -> memo.computeIfAbsent(x, v -> {
                try {
                    return quantities(input.set().apply(design, v), frequencyHz);
                } catch (InvalidInputException e) {
                    double[] none = new double[Quantity.values().length];
                    java.util.Arrays.fill(none, Double.NaN);
                    return none;
                }
            });
            double low = input.kelvin() ? x0 - kelvin : x0 * (1 - percent / 100);
            double high = input.kelvin() ? x0 + kelvin : x0 * (1 + percent / 100);
            double[] minus = relative(at.apply(low), base);
            double[] plus = relative(at.apply(high), base);
            double[] elasticity = new double[Quantity.values().length];
            for (Quantity q : Quantity.values()) {
                elasticity[q.ordinal()] = elasticity(at, x0, input.kelvin(), q.ordinal(), base[q.ordinal()]);
            }
            rows.add(new Row(input, minus, plus, elasticity));
        }
        rows.sort(Comparator.comparingDouble((Row r) -> r.magnitude(rankBy)).reversed());
        return rows;
    }

    /** |Z0|, α (dB/m), v_p, the ceiling and (for a pair) Zdiff at a frequency. */
    static double[] quantities(Design design, double frequencyHz) {
        LineModel model = design.toModel();
        LinePoint p = model.at(frequencyHz);
        FrequencyLimits limits = LimitFinder.find(model, design.lengthMetres(), design.threshold(),
                design.lossBudgetDb());
        double differential = design.geometry().isPair()
                ? design.toPair().modes(frequencyHz).differentialImpedanceOhm() : Double.NaN;
        return new double[] {p.z0MagnitudeOhm(), p.alphaDbPerMetre(), p.phaseVelocityMetresPerSecond(),
            limits.ceilingHz(), differential};
    }

    private static double[] relative(double[] changed, double[] base) {
        double[] out = new double[changed.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = base[i] == 0 ? Double.NaN : changed[i] / base[i] - 1;
        }
        return out;
    }

    /** d ln Q / d ln X (or d ln Q / dT for temperature) by a five-point finite difference. */
    private static double elasticity(java.util.function.DoubleFunction<double[]> at, double x0, boolean kelvin,
            int index, double base) {
        if (!(base != 0) || Double.isNaN(base)) {
            return Double.NaN;
        }
        FiniteDifferencesDifferentiator differentiator = new FiniteDifferencesDifferentiator(5, kelvin ? 0.5 : LOG_STEP);
        UnivariateDifferentiableFunction f = differentiator.differentiate((double u) -> {
            double x = kelvin ? x0 + u : x0 * Math.exp(u);
            return Math.log(Math.abs(at.apply(x)[index]));
        });
        DerivativeStructure value = f.value(new DerivativeStructure(1, 1, 0, 0.0));
        return value.getPartialDerivative(1);
    }
}
