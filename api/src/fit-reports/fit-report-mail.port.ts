/**
 * What fit reports need of people's mail preferences: who turned new-fit-report mail off, and the stop and
 * preferences links a mail carries. Follows own those preferences and provide this
 * (follows/follows-ports.module.ts), so fit reports do not import follows, whose fit news reads reports.
 */
export abstract class FitReportMailPreferences {
  abstract fitReportMailOff(userIds: string[]): Promise<Set<string>>;
  abstract fitReportMailLinks(userId: string): Promise<{ pageUrl: string; oneClickUrl: string; preferencesUrl: string }>;
}
