package org.bracewalk.ui;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.constructors;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaConstructor;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchCondition;
import com.tngtech.archunit.lang.ConditionEvents;
import com.tngtech.archunit.lang.SimpleConditionEvent;
import java.util.concurrent.Executor;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Database and file work stays off the JavaFX thread (issue 10, item 5), the static half: every
 * view model takes the executors it works on. (A static check cannot see which executor a lambda
 * goes to, since ArchUnit counts a lambda's calls as its enclosing method's; {@link
 * RecordOffTheUiThreadTest} holds the other half by running the view models.)
 */
class ViewModelThreadsTest {
  private static JavaClasses main;

  @BeforeAll
  static void importMain() {
    main = new ClassFileImporter()
        .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
        .importPackages("org.bracewalk");
  }

  @Test
  void everyViewModelTakesAnExecutor() {
    constructors()
        .that().areDeclaredInClassesThat().haveSimpleNameEndingWith("ViewModel")
        .and().areDeclaredInClassesThat().resideInAPackage("org.bracewalk.ui..")
        .and().arePublic()
        .should(new ArchCondition<JavaConstructor>("take an Executor") {
          @Override
          public void check(JavaConstructor c, ConditionEvents events) {
            boolean takes = c.getRawParameterTypes().stream().anyMatch(t -> t.isEquivalentTo(Executor.class));
            events.add(new SimpleConditionEvent(c, takes, c.getFullName() + (takes ? " takes" : " takes no")
                + " Executor"));
          }
        })
        .because("a view model does its database and file work on an injected background executor and"
            + " shows the results through the UI one; tests pass executors they run by hand")
        .check(main);
  }
}
