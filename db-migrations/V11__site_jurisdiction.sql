-- Whose rules a site stands under: 'uk', 'us', 'eu' or 'other'. The report cites the regulations
-- of that jurisdiction only and asks for the particulars they require.
--
-- Sites never change (V3's sites_never_change covers every column, this one too), so the
-- jurisdiction is given when a site is created. Sites stored before this migration are 'other':
-- nothing in their records says which rules apply, and a migration does not guess (their reports
-- cite no regulation specifically and say so, and still ask for every particular, as before).
--
-- V11 follows V10 of another change, merged first. A file migrated to V11 while V10 did not
-- exist yet (a development build of this branch alone) is refused once V10 appears: Flyway runs
-- with outOfOrder off. New files and files at V9 or V10 migrate in order.

ALTER TABLE sites ADD COLUMN jurisdiction TEXT NOT NULL DEFAULT 'other'
  CHECK (jurisdiction IN ('uk', 'us', 'eu', 'other'));
