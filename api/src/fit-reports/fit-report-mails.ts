import { composeMail } from '../infra/mail/compose-mail';
import type { OutgoingMail } from '../infra/mail/mail.service';
import type { FitReportOutcome } from './entities/fit-report.entity';

export interface FitReportArrivedMailInput {
  to: string;
  workshopName: string;
  guideTitle: string;
  reporterName: string;
  outcome: FitReportOutcome;
  parts: string;
  vehicle: string;
  /** The workshop's Fit reports page in the studio. */
  reviewUrl: string;
  /** Like every mail: a way to stop this kind of mail, one-click for mail clients, and the preferences page. */
  links: { pageUrl: string; oneClickUrl: string; preferencesUrl: string };
}

/**
 * The note an owner or editor gets when a reader sends a fit report. It repeats the reader's claim in
 * their words (never their address: the workshop sees names only) and links to the review page.
 */
export function fitReportArrivedMail(input: FitReportArrivedMailInput): OutgoingMail {
  const claim = input.outcome === 'fit' ? 'it fit' : 'it did not fit';
  return composeMail(
    input.to,
    `New fit report on “${input.guideTitle}”: ${claim}`,
    [
      `${input.reporterName} sent ${input.workshopName} a fit report from the guide “${input.guideTitle}”: ${claim}.`,
      `Parts: ${input.parts}`,
      ...(input.vehicle ? [`Vehicle: ${input.vehicle}`] : []),
      'A report is a reader’s claim, not a verified fit: tie it to a fit check and confirm it with evidence before you rely on it.',
      `You get this because you are an owner or editor of ${input.workshopName}. To stop mail about new fit reports, open ${input.links.pageUrl}`,
      `Choose what mail you get: ${input.links.preferencesUrl}`,
    ],
    { label: 'Review the fit report', url: input.reviewUrl },
    { 'List-Unsubscribe': `<${input.links.oneClickUrl}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
  );
}
