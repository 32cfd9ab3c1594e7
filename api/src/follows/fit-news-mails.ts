import { composeMail } from '../infra/mail/compose-mail';
import type { OutgoingMail } from '../infra/mail/mail.service';

export interface FitNews {
  to: string;
  news: 'confirmed' | 'no_fit';
  checkTitle: string;
  reason: string;
  evidence: string[];
  workshopName: string;
  assemblyName: string;
  buildTitle: string;
  /** The guide's checklist, or the reporter's account page when no published guide shows the assembly. */
  link: { label: string; url: string };
  because: FollowReason | { kind: 'report' };
}

export interface FollowReason {
  kind: 'follow';
  label: string;
  /** The studio page that unfollows (for people). */
  unsubscribePageUrl: string;
  /** The API address that unfollows in one POST (for mail clients, RFC 8058). */
  oneClickUnsubscribeUrl: string;
}

/** The e-mail a follower gets when a fit is confirmed or fails. */
export function fitNewsMail(news: FitNews): OutgoingMail {
  const outcome = news.news === 'confirmed' ? 'confirmed it fits, test-fitted on the vehicle' : 'found that it does not fit';
  return composeMail(
    news.to,
    `${news.news === 'confirmed' ? 'Fit confirmed' : 'No fit'}: ${news.checkTitle}`,
    [
      `${news.workshopName} has ${outcome}: “${news.checkTitle}” in “${news.assemblyName}” (${news.buildTitle}).`,
      ...(news.reason ? [`Their note: ${news.reason}`] : []),
      ...(news.evidence.length ? [`Evidence: ${news.evidence.join('; ')}.`] : []),
      news.because.kind === 'follow'
        ? `You get this because you follow ${news.because.label}. To stop, open ${news.because.unsubscribePageUrl}`
        : 'You get this because you sent a fit report that this check verifies.',
    ],
    news.link,
    news.because.kind === 'follow'
      ? { 'List-Unsubscribe': `<${news.because.oneClickUnsubscribeUrl}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' }
      : undefined,
  );
}
