package org.headway;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Holds the package layering of DEVELOPERS.md. One rule per layering decision. */
class ArchitectureTest {

    private static final String[] CORE = {
        "org.headway.caution..",
        "org.headway.units..",
        "org.headway.fluid..",
        "org.headway.pipe..",
        "org.headway.friction..",
        "org.headway.fitting..",
        "org.headway.dimensional..",
        "org.headway.rig..",
        "org.headway.correlation..",
        "org.headway.system..",
        "org.headway.network.."
    };

    /**
     * The one core class allowed a library outside the core: it borrows jackson-core's number
     * routines (FastDoubleParser and Schubfach), which are arithmetic, not a file format.
     */
    private static final String DECIMALS = "org.headway.units.Decimals";

    private static JavaClasses classes;

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.headway");
    }

    @Test
    void coreHasNoToolkitOrEdgeLibraries() {
        ArchRule rule = noClasses()
                .that()
                .resideInAnyPackage(CORE)
                .and()
                .doNotHaveFullyQualifiedName(DECIMALS)
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "javafx..",
                        "java.awt..",
                        "javax.swing..",
                        "picocli..",
                        "com.fasterxml.jackson..",
                        "org.apache.pdfbox..",
                        "org.jfree..",
                        "org.dhatim..")
                .because("the engines must run headless, in tests and batch jobs, and stay independent of"
                        + " the file formats and user interfaces at the edges");
        rule.check(classes);
    }

    @Test
    void decimalsBorrowsOnlyNumberRoutines() {
        ArchRule rule = noClasses()
                .that()
                .haveFullyQualifiedName(DECIMALS)
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "javafx..",
                        "java.awt..",
                        "javax.swing..",
                        "picocli..",
                        "com.fasterxml.jackson.databind..",
                        "com.fasterxml.jackson.core",
                        "com.fasterxml.jackson.core.json..",
                        "org.apache.pdfbox..",
                        "org.jfree..",
                        "org.dhatim..")
                .because("the decimal reader and writer may use jackson-core's number routines"
                        + " (com.fasterxml.jackson.core.io) and nothing else from the edges");
        rule.check(classes);
    }

    @Test
    void networkBuildsOnTheElementModelNotOnTheEdges() {
        ArchRule rule = noClasses()
                .that()
                .resideInAPackage("org.headway.network..")
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.project..", "org.headway.cli..", "org.headway.app..", "org.headway.report..")
                .because("the network solver takes elements and nodes; reading line lists and projects is the"
                        + " project package's job");
        rule.check(classes);
    }

    @Test
    void coreNeverPrints() {
        ArchRule rule = noClasses()
                .that()
                .resideInAnyPackage(CORE)
                .should()
                .accessField(System.class, "out")
                .orShould()
                .accessField(System.class, "err")
                .orShould()
                .callMethod(Throwable.class, "printStackTrace")
                .because("the engines return results and cautions; only the CLI and the app talk to the user");
        rule.check(classes);
    }

    @Test
    void unitsStayAtTheEdgesOfTheNumericalCore() {
        ArchRule rule = noClasses()
                .that()
                .resideInAnyPackage(
                        "org.headway.fluid..",
                        "org.headway.pipe..",
                        "org.headway.friction..",
                        "org.headway.fitting..",
                        "org.headway.dimensional..",
                        "org.headway.rig..",
                        "org.headway.correlation..",
                        "org.headway.system..")
                .should()
                .dependOnClassesThat(com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage(
                                "javax.measure..", "tech.units..", "systems.uom..", "org.headway.units..")
                        .and(com.tngtech.archunit.base.DescribedPredicate.not(
                                com.tngtech.archunit.core.domain.JavaClass.Predicates.equivalentTo(
                                        org.headway.units.Decimals.class))))
                .because("inside the core quantities are SI doubles; units are parsed and formatted only at the"
                        + " edges (the plain-decimal number rule, units.Decimals, carries no unit and is shared by"
                        + " every file reader)");
        rule.check(classes);
    }

    @Test
    void frictionDependsOnlyOnCaution() {
        ArchRule rule = noClasses()
                .that()
                .resideInAPackage("org.headway.friction..")
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.fluid..",
                        "org.headway.pipe..",
                        "org.headway.fitting..",
                        "org.headway.dimensional..",
                        "org.headway.rig..",
                        "org.headway.correlation..",
                        "org.headway.system..",
                        "org.headway.project..",
                        "org.headway.chart..",
                        "org.headway.report..",
                        "org.headway.cli..",
                        "org.headway.app..")
                .because("the friction engine is the base layer the others build on");
        rule.check(classes);
    }

    @Test
    void dataLayersDoNotReachUp() {
        ArchRule rule = noClasses()
                .that()
                .resideInAnyPackage("org.headway.fluid..", "org.headway.pipe..", "org.headway.caution..")
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.fitting..",
                        "org.headway.dimensional..",
                        "org.headway.rig..",
                        "org.headway.correlation..",
                        "org.headway.system..",
                        "org.headway.project..",
                        "org.headway.chart..",
                        "org.headway.report..",
                        "org.headway.cli..",
                        "org.headway.app..")
                .because("fluid and catalog data are leaves that the pipe-run engine stands on");
        rule.check(classes);
    }

    @Test
    void fittingAndDimensionalAnalysisStandAlone() {
        ArchRule rule = noClasses()
                .that()
                .resideInAnyPackage("org.headway.fitting..", "org.headway.dimensional..")
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.fluid..",
                        "org.headway.pipe..",
                        "org.headway.friction..",
                        "org.headway.rig..",
                        "org.headway.correlation..",
                        "org.headway.system..",
                        "org.headway.network..",
                        "org.headway.project..",
                        "org.headway.chart..",
                        "org.headway.report..",
                        "org.headway.cli..",
                        "org.headway.app..")
                .because("least-squares fitting and π groups are general numerical tools, used by the fitted"
                        + " correlations and the edges but knowing nothing of pipes, fluids or rigs");
        rule.check(classes);
    }

    @Test
    void fittingAndDimensionalAnalysisAreIndependent() {
        noClasses()
                .that()
                .resideInAPackage("org.headway.fitting..")
                .should()
                .dependOnClassesThat()
                .resideInAPackage("org.headway.dimensional..")
                .because("a fit takes any observations, π groups or not")
                .check(classes);
        noClasses()
                .that()
                .resideInAPackage("org.headway.dimensional..")
                .should()
                .dependOnClassesThat()
                .resideInAPackage("org.headway.fitting..")
                .because("π groups are found from dimensions alone, before any fit")
                .check(classes);
    }

    @Test
    void rigUsesFluidAndFrictionOnly() {
        ArchRule rule = noClasses()
                .that()
                .resideInAPackage("org.headway.rig..")
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.pipe..",
                        "org.headway.fitting..",
                        "org.headway.dimensional..",
                        "org.headway.correlation..",
                        "org.headway.system..",
                        "org.headway.network..",
                        "org.headway.project..",
                        "org.headway.chart..",
                        "org.headway.report..",
                        "org.headway.cli..",
                        "org.headway.app..")
                .because("rig data are reduced with the fluid models and compared with the friction"
                        + " correlations; reading rig files is the project package's job");
        rule.check(classes);
    }

    @Test
    void correlationDoesNotReachUp() {
        ArchRule rule = noClasses()
                .that()
                .resideInAPackage("org.headway.correlation..")
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.fluid..",
                        "org.headway.pipe..",
                        "org.headway.rig..",
                        "org.headway.dimensional..",
                        "org.headway.system..",
                        "org.headway.network..",
                        "org.headway.project..",
                        "org.headway.chart..",
                        "org.headway.report..",
                        "org.headway.cli..",
                        "org.headway.app..")
                .because("fitted correlations feed the pipe-run engine, not the other way round; they"
                        + " build on the fitting results and the friction interface only");
        rule.check(classes);
    }

    @Test
    void coreDoesNotReachTheEdges() {
        ArchRule rule = noClasses()
                .that()
                .resideInAnyPackage(CORE)
                .should()
                .dependOnClassesThat()
                .resideInAnyPackage(
                        "org.headway.project..",
                        "org.headway.chart..",
                        "org.headway.report..",
                        "org.headway.cli..",
                        "org.headway.app..")
                .because("the edges depend on the core, never the reverse");
        rule.check(classes);
    }

    @Test
    void commandLineAndDesktopAreIndependent() {
        noClasses()
                .that()
                .resideInAPackage("org.headway.cli..")
                .should()
                .dependOnClassesThat()
                .resideInAPackage("org.headway.app..")
                .because("the command line must run without JavaFX on the class path")
                .allowEmptyShould(true)
                .check(classes);
        noClasses()
                .that()
                .resideInAPackage("org.headway.app..")
                .should()
                .dependOnClassesThat()
                .resideInAPackage("org.headway.cli..")
                .because("the desktop app calls the engines directly, not the command line")
                .allowEmptyShould(true)
                .check(classes);
    }

    @Test
    void chartHasNoJavaFx() {
        noClasses()
                .that()
                .resideInAPackage("org.headway.chart..")
                .should()
                .dependOnClassesThat()
                .resideInAPackage("javafx..")
                .because("the same chart code draws into the PDF sheet, which has no JavaFX")
                .allowEmptyShould(true)
                .check(classes);
    }
}
