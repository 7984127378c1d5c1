package org.stasissheet;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.base.DescribedPredicate;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * Patient data never reaches a log. The simplest rule that guarantees it: main code has no logger at all, of any
 * kind, and never prints a stack trace (whose messages can carry field values). What a command has to say goes to
 * its own output streams, where the user sees it, and nowhere else. ({@code java.net} is forbidden in
 * {@link ArchitectureTest}.)
 */
@AnalyzeClasses(packages = "org.stasissheet", importOptions = ImportOption.DoNotIncludeTests.class)
class PrivacyTest {

    @ArchTest
    static final ArchRule noLoggingFramework = noClasses()
            .should().dependOnClassesThat().resideInAnyPackage(
                    "java.util.logging..", "org.slf4j..", "org.apache.logging..", "org.apache.log4j..",
                    "org.apache.commons.logging..", "ch.qos.logback..", "org.jboss.logging..")
            .because("a logger writes to places the user does not see and cannot clear; patient fields must not");

    @ArchTest
    static final ArchRule noSystemLogger = noClasses()
            .should().dependOnClassesThat().haveFullyQualifiedName("java.lang.System$Logger")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.lang.System$LoggerFinder")
            .orShould().callMethod(System.class, "getLogger", String.class)
            .because("System.Logger is a logger too");

    @ArchTest
    static final ArchRule noStackTraces = noClasses()
            .should().callMethodWhere(DescribedPredicate.describe("Throwable.printStackTrace",
                    call -> call.getTarget().getName().equals("printStackTrace")
                            && call.getTarget().getOwner().isAssignableTo(Throwable.class)))
            .because("a stack trace on the command line helps nobody at the bedside and may carry field values");
}
