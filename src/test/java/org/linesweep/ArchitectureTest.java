package org.linesweep;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** Dependencies point inward: physics ← sweep ← design ← io, cli, app; only app touches JavaFX. */
class ArchitectureTest {

    private static final JavaClasses CLASSES = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.linesweep");

    @Test
    void onlyTheAppImportsJavaFx() {
        noClasses().that().resideOutsideOfPackage("org.linesweep.app..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..")
                .check(CLASSES);
    }

    /** The observable model uses JavaFX's properties and collections, not the toolkit: its tests need no FX thread. */
    @Test
    void theObservableModelUsesOnlyJavaFxBeansAndCollections() {
        noClasses().that().resideInAPackage("org.linesweep.app.model..")
                .should().dependOnClassesThat(resideInAPackage("javafx..")
                        .and(not(resideInAnyPackage("javafx.beans..", "javafx.collections.."))))
                .check(CLASSES);
    }

    @Test
    void physicsDependsOnNothingOfOurs() {
        noClasses().that().resideInAPackage("org.linesweep.physics..")
                .should().dependOnClassesThat().resideInAnyPackage("org.linesweep.sweep..", "org.linesweep.design..",
                        "org.linesweep.io..", "org.linesweep.cli..", "org.linesweep.app..")
                .check(CLASSES);
    }

    @Test
    void sweepDependsOnlyOnPhysics() {
        noClasses().that().resideInAPackage("org.linesweep.sweep..")
                .should().dependOnClassesThat().resideInAnyPackage("org.linesweep.design..", "org.linesweep.io..",
                        "org.linesweep.cli..", "org.linesweep.app..")
                .check(CLASSES);
    }

    @Test
    void designDoesNotReachTheEdges() {
        noClasses().that().resideInAPackage("org.linesweep.design..")
                .should().dependOnClassesThat().resideInAnyPackage("org.linesweep.io..", "org.linesweep.cli..",
                        "org.linesweep.app..")
                .check(CLASSES);
    }

    @Test
    void edgesDoNotDependOnEachOther() {
        noClasses().that().resideInAnyPackage("org.linesweep.io..", "org.linesweep.cli..")
                .should().dependOnClassesThat().resideInAPackage("org.linesweep.app..")
                .check(CLASSES);
    }
}
