package org.bracewalk.core.port.report;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.bracewalk.core.model.Jurisdiction;

/**
 * Which regulations a report cites and which particulars it requires, by the site's jurisdiction
 * and the kind of structure. Sources and how sure they are: shared/design/trade-facts.md.
 *
 * <table>
 *   <caption>what each report cites and requires</caption>
 *   <tr><th></th><th>scaffold</th><th>storage racking</th></tr>
 *   <tr><td>UK</td><td>Work at Height Regulations 2005, Sch. 7 (its items 1-8) and reg. 12</td>
 *       <td>HSE HSG76 and EN 15635; the person responsible for storage equipment safety</td></tr>
 *   <tr><td>US</td><td>29 CFR 1926.451(f)(3) and (f)(4); the competent person and the shift</td>
 *       <td>none</td></tr>
 *   <tr><td>EU</td><td>none</td><td>EN 15635; the person responsible for storage equipment
 *       safety</td></tr>
 *   <tr><td>other</td><td>none</td><td>none</td></tr>
 * </table>
 *
 * <p>Where a report cites a regulation it requires that regulation's particulars (with the place,
 * the description, the time and the reporter's name, which any record needs: common practice).
 * Where it cites none it still requires that minimum and the reporter's position, except on a
 * site with no jurisdiction recorded, or a structure of another kind: Bracewalk then cannot tell
 * which particulars apply and requires every one it knows, as it did before jurisdictions were
 * recorded (the cautious side).
 */
public final class SiteRules {
  /** The sources a report may cite. */
  public enum Source {
    /** Work at Height Regulations 2005, Schedule 7 (report contents) and reg. 12 (timing). */
    WAHR_2005,
    /** 29 CFR 1926.451(f)(3) (inspection before each shift) and (f)(4) (the four actions). */
    CFR_1926_451,
    /** HSE HSG76, Warehousing and storage (racking inspections, the responsible person). */
    HSG76,
    /** EN 15635, steel static storage systems (damage limits, inspection). */
    EN_15635
  }

  private SiteRules() {}

  /**
   * The regulations and standards a report cites for a structure of {@code structureKind}
   * ({@code scaffold}, {@code racking}, {@code other}) on a site of {@code jurisdiction}.
   */
  public static Set<Source> cited(Jurisdiction jurisdiction, String structureKind) {
    boolean scaffold = "scaffold".equals(structureKind);
    boolean racking = "racking".equals(structureKind);
    return switch (jurisdiction) {
      case UK -> scaffold ? EnumSet.of(Source.WAHR_2005)
          : racking ? EnumSet.of(Source.HSG76, Source.EN_15635) : EnumSet.noneOf(Source.class);
      case US -> scaffold ? EnumSet.of(Source.CFR_1926_451) : EnumSet.noneOf(Source.class);
      case EU -> racking ? EnumSet.of(Source.EN_15635) : EnumSet.noneOf(Source.class);
      case OTHER -> EnumSet.noneOf(Source.class);
    };
  }

  /** The recorded particulars a report must carry; it is refused while one of them is empty. */
  public static List<Particular> required(Jurisdiction jurisdiction, String structureKind) {
    boolean racking = "racking".equals(structureKind);
    boolean known = "scaffold".equals(structureKind) || racking;
    if (jurisdiction == Jurisdiction.OTHER || !known) {
      List<Particular> all = new ArrayList<>();
      for (Particular p : Particular.values()) {
        if (p.recordedFor(racking)) {
          all.add(p);
        }
      }
      return all;
    }
    Set<Source> cited = cited(jurisdiction, structureKind);
    EnumSet<Particular> out = EnumSet.of(Particular.EQUIPMENT_LOCATION,
        Particular.EQUIPMENT_DESCRIPTION, Particular.INSPECTED_AT, Particular.REPORTER_NAME);
    if (cited.contains(Source.WAHR_2005)) {
      // Sch. 7: items 1-4 and 8 are recorded (5-7 the report draws up itself)
      out.addAll(EnumSet.of(Particular.CLIENT_NAME, Particular.CLIENT_ADDRESS,
          Particular.REPORTER_POSITION));
    } else if (cited.contains(Source.CFR_1926_451)) {
      // 1926.451(f)(3): a competent person inspects before each shift
      out.addAll(EnumSet.of(Particular.COMPETENT_PERSON, Particular.SHIFT));
    } else {
      out.add(Particular.REPORTER_POSITION);
    }
    if (cited.contains(Source.HSG76) || cited.contains(Source.EN_15635)) {
      out.add(Particular.STORAGE_SAFETY_PERSON);
    }
    return List.copyOf(out);
  }
}
