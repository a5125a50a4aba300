package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.StructureKind;
import org.junit.jupiter.api.Test;

/**
 * The note on the days between routine inspections cites the rules of the site's own
 * jurisdiction only, and defers to the local codes where Bracewalk holds none. Outside references
 * (shared/design/trade-facts.md, "When inspections happen"): UK, Work at Height Regulations 2005,
 * reg. 12, at most 7 days for a working platform (read); US, 29 CFR 1926.451(f)(3), before each
 * shift (read); racking, HSE HSG76 paras 643-646 (read) and EN 15635 (secondary), visual
 * inspections weekly or as the risk assessment sets.
 */
class IntervalRulesTest {
  private static final List<String> WAHR = List.of("Work at Height", "WAHR", "reg. 12");
  private static final List<String> CFR = List.of("1926", "CFR");
  private static final List<String> HSG76 = List.of("HSG76", "HSE");
  private static final List<String> EN15635 = List.of("EN 15635");

  private static String text(Jurisdiction j, StructureKind k, int days) {
    Optional<IntervalRules.Note> n = IntervalRules.note(j, k, "Test structure", days);
    assertThat(n).as("%s %s %d days", j, k, days).isPresent();
    return n.get().heading() + ": " + n.get().text();
  }

  private static void citesNone(String text, List<List<String>> sources) {
    for (List<String> source : sources) {
      for (String marker : source) {
        assertThat(text).doesNotContain(marker);
      }
    }
  }

  @Test
  void aUkScaffoldIsInspectedEverySevenDaysUnderReg12() {
    assertThat(IntervalRules.note(Jurisdiction.UK, StructureKind.SCAFFOLD, "s", 7)).isEmpty();
    String t = text(Jurisdiction.UK, StructureKind.SCAFFOLD, 8);
    assertThat(t).contains("at least every 7 days (Work at Height Regulations 2005, reg. 12)")
        .contains("Keep 8 days for 'Test structure'");
    citesNone(t, List.of(CFR, HSG76, EN15635));
  }

  @Test
  void aUsScaffoldIsInspectedBeforeEachShiftUnder1926451f3() {
    assertThat(IntervalRules.note(Jurisdiction.US, StructureKind.SCAFFOLD, "s", 1)).isEmpty();
    String t = text(Jurisdiction.US, StructureKind.SCAFFOLD, 7);
    assertThat(t).contains("before each shift").contains("(29 CFR 1926.451(f)(3))");
    citesNone(t, List.of(WAHR, HSG76, EN15635));
  }

  @Test
  void rackingCitesHsg76InTheUkAndEn15635InTheEu() {
    assertThat(IntervalRules.note(Jurisdiction.UK, StructureKind.RACKING_RUN, "r", 7)).isEmpty();
    String uk = text(Jurisdiction.UK, StructureKind.RACKING_RUN, 14);
    assertThat(uk).contains("weekly").contains("(HSE HSG76; EN 15635)");
    citesNone(uk, List.of(WAHR, CFR));
    String eu = text(Jurisdiction.EU, StructureKind.RACKING_RUN, 14);
    assertThat(eu).contains("weekly").contains("(EN 15635)");
    citesNone(eu, List.of(WAHR, CFR, HSG76));
  }

  @Test
  void elsewhereNoRuleIsNamedAndTheLocalCodesDecide() {
    for (Jurisdiction j : Jurisdiction.values()) {
      for (StructureKind k : StructureKind.values()) {
        boolean named = (j == Jurisdiction.UK && k != StructureKind.OTHER_FRAME)
            || (j == Jurisdiction.US && k == StructureKind.SCAFFOLD)
            || (j == Jurisdiction.EU && k == StructureKind.RACKING_RUN);
        if (named) {
          continue;
        }
        // common practice: the default of 7 days passes without a word
        assertThat(IntervalRules.note(j, k, "s", 7)).as("%s %s", j, k).isEmpty();
        String t = text(j, k, 10);
        assertThat(t).as("%s %s", j, k).contains("local codes that apply");
        citesNone(t, List.of(WAHR, CFR, HSG76, EN15635));
      }
    }
    assertThat(text(Jurisdiction.OTHER, StructureKind.SCAFFOLD, 10))
        .contains("The site records no jurisdiction");
    assertThat(text(Jurisdiction.EU, StructureKind.SCAFFOLD, 10))
        .contains("no rule of the European Union");
  }
}
