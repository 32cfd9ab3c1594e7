/**
 * What a public guide answer is built from, read in one indexed statement so a conditional GET can be
 * answered 304 without building the answer. Every live input of the answer has a term here, so any change
 * to it changes the row: a published revision never changes, so its id stands for all of its content;
 * rows with `updated_at` give their newest change, and sets without one (a part's place in the assembly,
 * the evidence of a check) give their size and a checksum of their members, so adding, removing or
 * swapping one shows too; a check's state is summed as well, so two changes within one millisecond of
 * `updated_at` still move the tag when the state moved. Draft edits (guides.updated_at) are left out:
 * readers never see them.
 */

/**
 * The tables the two statements below read. A committed write to any of them forgets the tags held in Redis
 * (`published-guide-cache.ts`), so a new term here must name its table here too.
 */
export const PUBLISHED_GUIDE_INPUT_TABLES: ReadonlySet<string> = new Set([
  'workshops',
  'guides',
  'guide_revisions',
  'builds',
  'footage',
  'transcripts',
  'assemblies',
  'assembly_parts',
  'parts',
  'fit_checks',
  'fit_check_evidence',
  'marks',
]);

// The footage and assembly a revision shows are fixed in its content; JSON_VALUE reads them there
// (CONVERT … COLLATE so the comparison with the id columns may use their primary keys).
const REVISION_FOOTAGE_ID = "CONVERT(JSON_VALUE(r.content, '$.footageId') USING utf8mb4) COLLATE utf8mb4_unicode_ci";
const REVISION_ASSEMBLY_ID = "CONVERT(JSON_VALUE(r.content, '$.assemblyId') USING utf8mb4) COLLATE utf8mb4_unicode_ci";

/**
 * One row for a published guide of an enabled workshop; none when it is not published (the read answers 404).
 * The subqueries name their keys (STRAIGHT_JOIN, FORCE INDEX): this runs on every public read, and with a few
 * rows or statistics not yet refreshed the optimizer would otherwise scan the evidence and marks tables.
 */
export const PUBLISHED_GUIDE_VERSION_SQL = `
SELECT
  g.published_revision_id AS revisionId,
  w.updated_at AS workshopAt,
  w.show_member_names AS showMemberNames,
  b.id AS buildId,
  b.updated_at AS buildAt,
  f.id AS footageId,
  f.updated_at AS footageAt,
  (SELECT t.id FROM transcripts t WHERE t.footage_id = f.id AND t.is_active = 1) AS transcriptId,
  a.id AS assemblyId,
  a.updated_at AS assemblyAt,
  (SELECT STRAIGHT_JOIN CONCAT_WS(':', COUNT(*), SUM(CRC32(CONCAT_WS('|', ap.part_id, ap.position, ap.sort_order))), MAX(p.updated_at))
     FROM assembly_parts ap FORCE INDEX (PRIMARY) JOIN parts p FORCE INDEX (PRIMARY) ON p.id = ap.part_id WHERE ap.assembly_id = a.id) AS parts,
  (SELECT CONCAT_WS(':', COUNT(*), MAX(c.updated_at), SUM(CRC32(CONCAT_WS('|', c.id, c.state, c.required))))
     FROM fit_checks c FORCE INDEX (idx_fit_checks_assembly) WHERE c.assembly_id = a.id) AS checks,
  (SELECT STRAIGHT_JOIN CONCAT_WS(':', COUNT(*), SUM(CRC32(e.id)))
     FROM fit_checks c FORCE INDEX (idx_fit_checks_assembly)
     JOIN fit_check_evidence e FORCE INDEX (idx_evidence_check) ON e.fit_check_id = c.id WHERE c.assembly_id = a.id) AS evidence,
  (SELECT STRAIGHT_JOIN CONCAT_WS(':', COUNT(*), MAX(m.updated_at))
     FROM fit_checks c FORCE INDEX (idx_fit_checks_assembly)
     JOIN marks m FORCE INDEX (fk_marks_fit_check) ON m.fit_check_id = c.id WHERE c.assembly_id = a.id) AS checkMarks,
  (SELECT STRAIGHT_JOIN CONCAT_WS(':', COUNT(*), MAX(m.updated_at))
     FROM fit_checks c FORCE INDEX (idx_fit_checks_assembly)
     JOIN fit_check_evidence e FORCE INDEX (idx_evidence_check) ON e.fit_check_id = c.id
     JOIN marks m FORCE INDEX (PRIMARY) ON m.id = e.mark_id
    WHERE c.assembly_id = a.id) AS evidenceMarks
FROM workshops w
JOIN guides g ON g.workshop_id = w.id AND g.slug = ?
JOIN guide_revisions r ON r.id = g.published_revision_id
JOIN builds b ON b.id = g.build_id
LEFT JOIN footage f ON f.id = ${REVISION_FOOTAGE_ID} AND f.workshop_id = w.id
LEFT JOIN assemblies a ON a.id = ${REVISION_ASSEMBLY_ID} AND a.workshop_id = w.id
WHERE w.slug = ? AND w.disabled_at IS NULL`;

/**
 * One row for the whole index (any search narrows the same set): which guides are published at which
 * revision, and the newest change to their workshops, builds and footage (posters). The published guides are
 * read from their key and the rest by primary key, named so that small tables never turn it into scans.
 */
export const PUBLISHED_INDEX_VERSION_SQL = `
SELECT STRAIGHT_JOIN
  COUNT(*) AS guides,
  SUM(CRC32(CONCAT(g.id, g.published_revision_id))) AS revisions,
  MAX(w.updated_at) AS workshopAt,
  MAX(b.updated_at) AS buildAt,
  MAX(f.updated_at) AS footageAt
FROM guides g FORCE INDEX (idx_guides_published)
JOIN workshops w FORCE INDEX (PRIMARY) ON w.id = g.workshop_id AND w.disabled_at IS NULL
JOIN guide_revisions r FORCE INDEX (PRIMARY) ON r.id = g.published_revision_id
JOIN builds b FORCE INDEX (PRIMARY) ON b.id = g.build_id
LEFT JOIN footage f FORCE INDEX (PRIMARY) ON f.id = ${REVISION_FOOTAGE_ID}
WHERE g.published_revision_id IS NOT NULL`;
