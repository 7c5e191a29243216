package barwright.architecture;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

/**
 * The shape of the code (brief, "Shape of the code"; shared/guides/code-shape.md): the computation core
 * imports no GUI library, depends on no edge (command line, window), and the packages have no cycles.
 * Core packages not yet written (solver, sizing, insight) are named so that they are covered when they come.
 */
@AnalyzeClasses(packages = "barwright", importOptions = ImportOption.DoNotIncludeTests.class)
class CoreArchitectureTest {
    private static final String[] CORE = {"barwright.units..", "barwright.model..", "barwright.physics..",
            "barwright.solver..", "barwright.io..", "barwright.report..", "barwright.sizing..", "barwright.insight..",
            "barwright.tyrefit.."};

    @ArchTest
    static final ArchRule coreImportsNoGui = noClasses().that().resideInAnyPackage(CORE)
            .should().dependOnClassesThat().resideInAnyPackage("java.awt..", "javax.swing..", "org.jfree..",
                    "com.formdev..")
            .because("the core must run with no display and the GUI depends on it, never the reverse");

    @ArchTest
    static final ArchRule coreDoesNotReachTheEdges = noClasses().that().resideInAnyPackage(CORE)
            .should().dependOnClassesThat().resideInAnyPackage("barwright.cli..", "barwright.ui..")
            .because("the command line and the window use the core, not the other way round");

    @ArchTest
    static final ArchRule packagesHaveNoCycles = slices().matching("barwright.(*)..").should().beFreeOfCycles();
}
