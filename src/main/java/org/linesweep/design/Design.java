package org.linesweep.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.linesweep.physics.Conductor;
import org.linesweep.physics.LimitFinder;
import org.linesweep.physics.LineModel;
import org.linesweep.physics.PhysicalConstants;

/**
 * A complete, validated design: what a design file holds.
 *
 * @param name a short name
 * @param description one line saying what the design is for
 * @param geometry type and cross-section
 * @param conductor the conductor (all conductors of the line are of it)
 * @param dielectric the dielectric
 * @param lengthMetres physical length of the line, m
 * @param temperatureKelvin operating temperature of the conductors, K
 * @param sweep the frequency sweep
 * @param threshold the L/λ threshold for the electrical-length limit
 * @param lossBudgetDb total-loss budget, dB; NaN for none
 */
public record Design(String name, String description, Geometry geometry, ConductorSpec conductor,
        DielectricSpec dielectric, double lengthMetres, double temperatureKelvin, SweepSettings sweep,
        double threshold, double lossBudgetDb) {

    /** The current design-file format version. */
    public static final int FORMAT_VERSION = 1;
    /** Default operating temperature: 20 °C. */
    public static final double DEFAULT_TEMPERATURE_KELVIN = Conductor.REFERENCE_TEMPERATURE_KELVIN;
    /** Temperatures outside this range (−60..+200 °C) compute but are flagged. */
    static final double WARN_TEMPERATURE_LOW_KELVIN = -60 + PhysicalConstants.ZERO_CELSIUS_KELVIN;
    static final double WARN_TEMPERATURE_HIGH_KELVIN = 200 + PhysicalConstants.ZERO_CELSIUS_KELVIN;

    public Design {
        name = name == null ? "" : name;
        description = description == null ? "" : description;
        if (geometry == null) {
            throw new InvalidInputException("line", null, "a design needs a line");
        }
        if (conductor == null) {
            throw new InvalidInputException("conductor", null, "a design needs a conductor");
        }
        if (dielectric == null) {
            throw new InvalidInputException("dielectric", null, "a design needs a dielectric");
        }
        Rule.LINE_LENGTH.check("length", lengthMetres);
        Rule.TEMPERATURE.check("temperature", temperatureKelvin);
        double resistivityFactor = 1.0 + conductor.temperatureCoefficientPerKelvin()
                * (temperatureKelvin - Conductor.REFERENCE_TEMPERATURE_KELVIN);
        if (resistivityFactor < 0.05) {
            throw new InvalidInputException("temperature", String.format(Locale.ROOT, "%.2f K", temperatureKelvin),
                    "the linear temperature law of the conductor's resistivity gives a resistivity below 5 % of its"
                            + " 20 degC value there; choose a temperature nearer 20 degC");
        }
        if (sweep == null) {
            sweep = SweepSettings.DEFAULT;
        }
        Rule.THRESHOLD.check("threshold", threshold);
        if (!Double.isNaN(lossBudgetDb)) {
            Rule.LOSS_BUDGET.check("lossBudget", lossBudgetDb);
        }
    }

    /** The physics model of this design. */
    public LineModel toModel() {
        return geometry.toModel(conductor.toConductor(temperatureKelvin), dielectric.toDielectric());
    }

    /** The edge-coupled pair this design describes, or null for a single line. */
    public org.linesweep.physics.CoupledPair toPair() {
        return geometry.toPair(dielectric.toDielectric());
    }

    /** This design with one geometry field changed. */
    public Design withGeometryValue(String field, double valueMetres) {
        return withGeometry(geometry.with(field, valueMetres));
    }

    public Design withGeometry(Geometry newGeometry) {
        return new Design(name, description, newGeometry, conductor, dielectric, lengthMetres, temperatureKelvin,
                sweep, threshold, lossBudgetDb);
    }

    public Design withConductor(ConductorSpec newConductor) {
        return new Design(name, description, geometry, newConductor, dielectric, lengthMetres, temperatureKelvin,
                sweep, threshold, lossBudgetDb);
    }

    public Design withDielectric(DielectricSpec newDielectric) {
        return new Design(name, description, geometry, conductor, newDielectric, lengthMetres, temperatureKelvin,
                sweep, threshold, lossBudgetDb);
    }

    public Design withLength(double newLengthMetres) {
        return new Design(name, description, geometry, conductor, dielectric, newLengthMetres, temperatureKelvin,
                sweep, threshold, lossBudgetDb);
    }

    public Design withTemperature(double newTemperatureKelvin) {
        return new Design(name, description, geometry, conductor, dielectric, lengthMetres, newTemperatureKelvin,
                sweep, threshold, lossBudgetDb);
    }

    public Design withSweep(SweepSettings newSweep) {
        return new Design(name, description, geometry, conductor, dielectric, lengthMetres, temperatureKelvin,
                newSweep, threshold, lossBudgetDb);
    }

    public Design withThreshold(double newThreshold) {
        return new Design(name, description, geometry, conductor, dielectric, lengthMetres, temperatureKelvin,
                sweep, newThreshold, lossBudgetDb);
    }

    public Design withLossBudget(double newLossBudgetDb) {
        return new Design(name, description, geometry, conductor, dielectric, lengthMetres, temperatureKelvin,
                sweep, threshold, newLossBudgetDb);
    }

    /**
     * Everything about this design that computes but lies outside a published formula's stated validity
     * range, in words: the line model's own warnings plus temperature and sweep checks.
     */
    public List<String> warnings() {
        return warnings(toModel());
    }

    /** {@link #warnings()} for this design's model, already built (it must be this design's). */
    public List<String> warnings(LineModel model) {
        List<String> warnings = new ArrayList<>(model.validityWarnings());
        if (geometry.isPair()) {
            warnings.addAll(toPair().validityWarnings());
        }
        if (temperatureKelvin < WARN_TEMPERATURE_LOW_KELVIN || temperatureKelvin > WARN_TEMPERATURE_HIGH_KELVIN) {
            warnings.add(String.format(Locale.ROOT, "temperature: %.1f degC is outside -60..200 degC, where the"
                    + " linear resistivity law is trustworthy",
                    temperatureKelvin - PhysicalConstants.ZERO_CELSIUS_KELVIN));
        }
        if (model instanceof org.linesweep.physics.MicrostripLine microstrip
                && sweep.toHz() > microstrip.dispersionValidityLimitHz()) {
            warnings.add("microstrip: the sweep goes above h/λ0 = 0.13 ("
                    + Units.engineering(microstrip.dispersionValidityLimitHz(), "Hz", 3)
                    + "), the Kirschning-Jansen dispersion range");
        }
        double mode = model.higherModeCutoffHz();
        if (!Double.isNaN(mode) && sweep.toHz() > mode) {
            warnings.add("the sweep goes above the first higher-order mode (" + Units.engineering(mode, "Hz", 4)
                    + "); the TEM model does not hold there");
        }
        double radiation = LimitFinder.radiationSpacing(model);
        if (!Double.isNaN(radiation) && sweep.toHz() > radiation) {
            warnings.add("open line: above " + Units.engineering(radiation, "Hz", 3)
                    + " the conductor spacing exceeds a tenth of a wavelength and the line radiates"
                    + " (not modelled)");
        }
        return warnings;
    }
}
