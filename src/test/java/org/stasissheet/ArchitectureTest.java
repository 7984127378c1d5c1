package org.stasissheet;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The boundaries that keep the core pure and the tool offline. */
@AnalyzeClasses(packages = "org.stasissheet", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {
    private static final String[] CORE = {
        "org.stasissheet.measure..", "org.stasissheet.intake..", "org.stasissheet.rules..",
        "org.stasissheet.derived..", "org.stasissheet.flow..", "org.stasissheet.apheresis..",
        "org.stasissheet.worksheet..", "org.stasissheet.labs..", "org.stasissheet.course.."
    };
    private static final String[] ADAPTERS = {
        "org.stasissheet.files..", "org.stasissheet.report..", "org.stasissheet.cli..", "org.stasissheet.ui..",
        "org.stasissheet.interop..", "org.stasissheet.load.."
    };

    @ArchTest
    static final ArchRule coreKnowsNoJavaFx = noClasses().that().resideInAnyPackage(CORE)
            .should().dependOnClassesThat().resideInAnyPackage("javafx..")
            .because("the core must run without a display and be testable without the toolkit");

    @ArchTest
    static final ArchRule coreKnowsNoAdapter = noClasses().that().resideInAnyPackage(CORE)
            .should().dependOnClassesThat().resideInAnyPackage(ADAPTERS)
            .because("data travels one way: case -> core -> worksheet -> renderers");

    @ArchTest
    static final ArchRule coreDoesNoFileIo = noClasses().that().resideInAnyPackage(CORE)
            .should().dependOnClassesThat().resideInAnyPackage("java.nio.file..")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.File")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileInputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileOutputStream")
            .because("the core is handed bytes; the files package reads and writes them");

    @ArchTest
    static final ArchRule onlyTheFormKnowsJavaFx = noClasses().that().resideOutsideOfPackage("org.stasissheet.ui..")
            .should().dependOnClassesThat().resideInAnyPackage("javafx..")
            .because("the command line must run without loading JavaFX");

    private static final String[] DATABASE = {"java.sql..", "javax.sql..", "org.flywaydb..", "org.sqlite..",
        "org.postgresql.."};

    @ArchTest
    static final ArchRule onlyTheRegisterStoreKnowsTheDatabase = noClasses()
            .that().resideOutsideOfPackage("org.stasissheet.register.store..")
            .should().dependOnClassesThat().resideInAnyPackage(DATABASE)
            .because("the JDBC and Flyway classes load only when a register command runs, and the core never "
                    + "sees a database");

    @ArchTest
    static final ArchRule registerModelIsPure = noClasses().that().resideInAPackage("org.stasissheet.register")
            .should().dependOnClassesThat().resideInAnyPackage("javafx..", "java.nio.file..", "java.io..",
                    "org.stasissheet.register.store..", "org.stasissheet.cli..", "org.stasissheet.ui..",
                    "org.stasissheet.files..")
            .because("the register's records and rules are plain values; the store, the command line and the form "
                    + "are adapters around them");

    @ArchTest
    static final ArchRule flowDoesNotReachIntoApheresis = noClasses().that().resideInAPackage("org.stasissheet.flow..")
            .should().dependOnClassesThat().resideInAPackage("org.stasissheet.apheresis..")
            .because("flow and apheresis are siblings: what both need lives in derived, below both");

    @ArchTest
    static final ArchRule apheresisDoesNotReachIntoFlow = noClasses().that()
            .resideInAPackage("org.stasissheet.apheresis..")
            .should().dependOnClassesThat().resideInAPackage("org.stasissheet.flow..")
            .because("flow and apheresis are siblings: what both need lives in derived, below both");

    @ArchTest
    static final ArchRule derivedStaysBelowBoth = noClasses().that().resideInAPackage("org.stasissheet.derived..")
            .should().dependOnClassesThat().resideInAnyPackage("org.stasissheet.flow..",
                    "org.stasissheet.apheresis..", "org.stasissheet.worksheet..")
            .because("derived quantities sit below flow and apheresis, so they must not import either");

    @ArchTest
    static final ArchRule onlyInteropKnowsHapi = noClasses().that().resideOutsideOfPackage("org.stasissheet.interop..")
            .should().dependOnClassesThat().resideInAnyPackage("ca.uhn..", "org.hl7..")
            .because("the FHIR and HL7 libraries stay behind one adapter, loaded only by the commands that use it");

    @ArchTest
    static final ArchRule formAndCommandLineStandSideBySide = noClasses().that().resideInAPackage("org.stasissheet.ui..")
            .should().dependOnClassesThat().resideInAnyPackage("org.stasissheet.cli..")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("org.stasissheet.Main")
            .because("the form and the command line share their loading seam in the load package, not each other");

    @ArchTest
    static final ArchRule commandLineKnowsNoForm = noClasses().that().resideInAPackage("org.stasissheet.cli..")
            .should().dependOnClassesThat().resideInAnyPackage("org.stasissheet.ui..")
            .because("the command line must run without the form");

    @ArchTest
    static final ArchRule loadingSeamKnowsNeitherAdapter = noClasses().that().resideInAPackage("org.stasissheet.load..")
            .should().dependOnClassesThat().resideInAnyPackage("org.stasissheet.cli..", "org.stasissheet.ui..")
            .because("both adapters build on it, so it must not lean on either");

    @ArchTest
    static final ArchRule noNetworkCode = noClasses().should().dependOnClassesThat().resideInAnyPackage("java.net..")
            .because("patient data never leaves the machine");
}
