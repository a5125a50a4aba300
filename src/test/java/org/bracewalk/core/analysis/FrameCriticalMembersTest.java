package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * Critical frame members and critical braces by removal and rank: for every member that is there
 * (ledger, standard, each half of a cross), remove it alone and count the freedoms again from the
 * exact rank of the rigidity matrix (L. Asimow, B. Roth, Trans. AMS 245 (1978)); the member is
 * critical iff they grow (check-contract.md, "Frame members": its loss alone adds a freedom). That
 * is a coloop of the row matroid (analysis.md) whose loss leaves no joint bare: a member that alone
 * holds a joint carries no force, but losing it takes the joint and its freedom away.
 */
class FrameCriticalMembersTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  @Test
  void criticalMembersAndBracesAreThoseWhoseRemovalAloneAddsAFreedom() {
    Random rnd = new Random(0xC217_0001L);
    int members = 0;
    int braces = 0;
    for (int k = 0; k < 120; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      BuiltFrame state = FramePlanes.state(rnd, 5, s, 0.2);
      StateAnalysis a = engine.analyseState(state);
      FrameEngineChecks.assertCriticalMatch(a, state);
      members += a.criticalMembers().size();
      braces += a.criticalBraces().size();
    }
    assertThat(members).isGreaterThan(200);
    assertThat(braces).isGreaterThan(50);
  }
}
