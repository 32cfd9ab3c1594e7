/**
 * What fit checks need to know of marks: whether a mark given as evidence is the workshop's. The marks
 * domain owns that table and provides this (marks/marks-ports.module.ts), so fit checks neither read it
 * nor import marks, which itself links marks to checks.
 */
export abstract class EvidenceMarks {
  abstract existsInWorkshop(workshopId: string, markId: string): Promise<boolean>;
}
