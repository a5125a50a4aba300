package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.SiteRepository;

/** Sites in table {@code sites}. */
final class JdbcSiteRepository implements SiteRepository {
  private static final String INSERT =
      """
      INSERT INTO sites (name, client_name, client_address, location, time_zone, display_units,
        jurisdiction, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String SELECT =
      """
      SELECT id, name, client_name, client_address, location, time_zone, display_units, jurisdiction
      FROM sites
      """;

  private final Database db;

  JdbcSiteRepository(Database db) {
    this.db = db;
  }

  @Override
  public Site add(Site site) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(INSERT, Statement.RETURN_GENERATED_KEYS)) {
            s.setString(1, site.name());
            s.setString(2, site.clientName());
            s.setString(3, site.clientAddress());
            s.setString(4, site.location());
            s.setString(5, site.timeZone().getId());
            s.setString(6, site.units().label());
            s.setString(7, site.jurisdiction().label());
            s.setString(8, db.newUuid(GlobalIdentities.Kind.SITE));
            s.executeUpdate();
            return site.withId(db.lastInsertId());
          }
        },
        SqlErrors.Subject.of("site '" + site.name() + "'"));
  }

  @Override
  public Optional<Site> find(long id) {
    List<Site> found = query(SELECT + " WHERE id = ?", id);
    return found.stream().findFirst();
  }

  @Override
  public List<Site> all() {
    return query(SELECT + " ORDER BY id", null);
  }

  private List<Site> query(String sql, Long id) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(sql)) {
            if (id != null) {
              s.setLong(1, id);
            }
            try (ResultSet r = s.executeQuery()) {
              List<Site> out = new ArrayList<>();
              while (r.next()) {
                out.add(read(r));
              }
              return out;
            }
          }
        });
  }

  private static Site read(ResultSet r) throws SQLException {
    return new Site(
        r.getLong("id"),
        r.getString("name"),
        r.getString("client_name"),
        r.getString("client_address"),
        r.getString("location"),
        ZoneId.of(r.getString("time_zone")),
        DisplayUnits.fromLabel(r.getString("display_units")),
        Jurisdiction.fromLabel(r.getString("jurisdiction")));
  }
}
