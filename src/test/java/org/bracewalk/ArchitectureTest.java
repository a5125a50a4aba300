package org.bracewalk;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.fields;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchRule;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The layering of DEVELOPERS.md, enforced. Every rule says why. */
class ArchitectureTest {
  private static JavaClasses main;

  @BeforeAll
  static void importMain() {
    main =
        new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.bracewalk");
  }

  private static void check(ArchRule rule) {
    rule.allowEmptyShould(true).check(main);
  }

  @Test
  void coreDependsOnNothingOutward() {
    check(
        noClasses()
            .that()
            .resideInAPackage("org.bracewalk.core..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                "org.bracewalk.app..",
                "org.bracewalk.store..",
                "org.bracewalk.report..",
                "org.bracewalk.ui..",
                "org.bracewalk.cli..",
                "org.bracewalk.boot..",
                "org.bracewalk.bench..")
            .because("the engine and the model are the centre: everything depends on them, never"
                + " the other way"));
  }

  @Test
  void modelUsesTheJdkOnly() {
    check(
        classes()
            .that()
            .resideInAPackage("org.bracewalk.core.model..")
            .should()
            .onlyDependOnClassesThat()
            .resideInAnyPackage("org.bracewalk.core.model..", "java..")
            .because("records and enums of the domain must be usable anywhere, with no library"));
  }

  @Test
  void frontEndsCallUseCasesOnly() {
    check(
        noClasses()
            .that()
            .resideInAnyPackage("org.bracewalk.cli..", "org.bracewalk.ui..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.bracewalk.core.port..", "org.bracewalk.store..")
            .because("a use case lives in app once and every front end calls it: a front end that"
                + " reached the ports or the store would be writing a use case of its own (as the"
                + " command line once committed an observation and its photos in two transactions)"));
  }

  @Test
  void appDoesNotSeeAdapters() {
    check(
        noClasses()
            .that()
            .resideInAPackage("org.bracewalk.app..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage(
                "org.bracewalk.store..",
                "org.bracewalk.report..",
                "org.bracewalk.ui..",
                "org.bracewalk.cli..",
                "org.bracewalk.boot..",
                "org.bracewalk.bench..",
                "javafx..",
                "java.sql..",
                "com.lowagie..",
                "picocli..")
            .because("use cases talk to the outside only through core.port, so they run in plain"
                + " tests and behind any front end"));
  }

  @Test
  void frontEndsGoThroughTheApplication() {
    check(
        noClasses()
            .that()
            .resideInAnyPackage("org.bracewalk.ui..", "org.bracewalk.cli..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.bracewalk.store..", "org.bracewalk.report..")
            .because("screens and commands call app services; only boot wires the adapters"));
  }

  @Test
  void adaptersDoNotSeeFrontEnds() {
    check(
        noClasses()
            .that()
            .resideInAnyPackage("org.bracewalk.store..", "org.bracewalk.report..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("org.bracewalk.ui..", "org.bracewalk.cli..", "org.bracewalk.boot..")
            .because("adapters implement core.port and know nothing of who uses them"));
  }

  @Test
  void javaFxOnlyInUiAndBoot() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackages("org.bracewalk.ui..", "org.bracewalk.boot..", "org.bracewalk.bench..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("javafx..")
            .because("the toolkit is a front end; the rest runs headless and in plain tests"));
  }

  @Test
  void jdbcAndFlywayOnlyInStore() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackage("org.bracewalk.store..")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("java.sql..", "org.flywaydb..")
            .because("the database is one adapter; SQL lives beside the repository that runs it"));
  }

  @Test
  void pdfOnlyInReport() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackage("org.bracewalk.report..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("com.lowagie..")
            .because("OpenPDF is one adapter behind the report renderer port"));
  }

  @Test
  void picocliOnlyInCli() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackages("org.bracewalk.cli..", "org.bracewalk.boot..", "org.bracewalk.bench..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("picocli..")
            .because("the command line is thin and replaceable; boot only builds it"));
  }

  @Test
  void bouncyCastleOnlyThroughOpenPdf() {
    check(
        noClasses()
            .should()
            .dependOnClassesThat()
            .resideInAPackage("org.bouncycastle..")
            .because("BouncyCastle is on the class path only for OpenPDF's signatures (PdfPKCS7);"
                + " our signing goes through OpenPDF in the report adapter"));
  }

  @Test
  void benchmarkAndPictureScaffoldingIsUsedByNothingButTheCompositionRoot() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackages("org.bracewalk.bench..", "org.bracewalk.boot..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("org.bracewalk.bench..")
            .because("timings, demo walks and screen pictures are tools beside the product: boot"
                + " registers their commands, and no use case, screen or command may come to rely"
                + " on them"));
  }

  @Test
  void jgraphtOnlyInTheEngine() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackage("org.bracewalk.core.analysis..")
            .should()
            .dependOnClassesThat()
            .resideInAPackage("org.jgrapht..")
            .because("graph algorithms are the engine's business; its public types are our own"));
  }

  @Test
  void viewModelsDoNotTouchTheSceneGraph() {
    check(
        noClasses()
            .that()
            .haveSimpleNameEndingWith("ViewModel")
            .should()
            .dependOnClassesThat()
            .resideInAnyPackage("javafx.scene..", "javafx.stage..", "javafx.application..")
            .because("view models hold state and validation and are tested without the toolkit"));
  }

  @Test
  void viewModelsTakeTheServicesTheyUseNotTheBag() {
    check(
        noClasses()
            .that()
            .haveSimpleNameEndingWith("ViewModel")
            .and()
            .resideInAPackage("org.bracewalk.ui..")
            .should()
            .dependOnClassesThat()
            .haveFullyQualifiedName("org.bracewalk.app.AppServices")
            .because("a view model names the services it uses, so what it can reach is plain from its"
                + " constructor and a test builds only those; ui.AppScreens passes them"));
  }

  @Test
  void noPackageCycles() {
    check(
        slices()
            .matching("org.bracewalk.(**)")
            .should()
            .beFreeOfCycles()
            .because("layers depend inwards only"));
  }

  @Test
  void noConsoleOutsideTheEntryPoints() {
    check(
        noClasses()
            .that()
            .resideOutsideOfPackages("org.bracewalk.cli..", "org.bracewalk.boot..", "org.bracewalk.bench..")
            .should()
            .accessField(System.class, "out")
            .orShould()
            .accessField(System.class, "err")
            .because("output goes through the writers a caller passes in, so it can be tested"));
  }

  @Test
  void staticFieldsAreFinal() {
    check(
        fields()
            .that()
            .areStatic()
            .should()
            .beFinal()
            .because("no static mutable state: services are passed in by constructor"));
  }
}
