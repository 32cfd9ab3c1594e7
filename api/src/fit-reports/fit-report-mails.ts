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
    ],
    { label: 'Review the fit report', url: input.reviewUrl },
  );
}
