package org.linesweep.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.linesweep.physics.ConductorMaterial;
import org.linesweep.physics.DielectricMaterial;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code linesweep materials}: the built-in catalogue with its nominal values and sources. */
@Command(name = "materials", mixinStandardHelpOptions = true,
        description = "List the built-in conductors and dielectrics with their nominal values and sources.")
final class MaterialsCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("Conductors (at 20 degC):");
        out.printf(Locale.ROOT, "  %-16s %14s %12s %8s  %s%n", "key", "sigma S/m", "alpha20 1/K", "mu_r", "source");
        for (ConductorMaterial m : ConductorMaterial.values()) {
            out.printf(Locale.ROOT, "  %-16s %14.4g %12.5g %8.4g  %s%n", m.key(), m.conductivitySiemensPerMetre(),
                    m.temperatureCoefficientPerKelvin(), m.relativePermeability(), m.source());
        }
        out.println("Dielectrics:");
        out.printf(Locale.ROOT, "  %-18s %8s %10s %10s %-15s %s%n", "key", "eps_r", "tan_delta", "at Hz", "model",
                "source");
        for (DielectricMaterial m : DielectricMaterial.values()) {
            out.printf(Locale.ROOT, "  %-18s %8.4g %10.3g %10.3g %-15s %s%n", m.key(), m.relativePermittivity(),
                    m.lossTangent(), m.referenceFrequencyHz(), m.defaultModel().key(), m.source());
        }
        out.flush();
        return ExitStatus.OK;
    }
}
