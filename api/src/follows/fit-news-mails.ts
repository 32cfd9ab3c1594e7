import { composeMail } from '../infra/mail/compose-mail';
import type { OutgoingMail } from '../infra/mail/mail.service';
import { detectSafetyTopics, standardCautions } from '../engine/safety-topics';

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
  because: FollowReason | ReportReason;
  /** Every fit-news mail carries a way out, whatever brought it. */
  unsubscribe: UnsubscribeLinks;
}

export interface FollowReason {
  kind: 'follow';
  label: string;
}

export interface ReportReason {
  kind: 'report';
}

export interface UnsubscribeLinks {
  /** The studio page that stops this mail and lists what else would still bring it (for people). */
  pageUrl: string;
  /** The API address that stops it in one POST (for mail clients, RFC 8058). */
  oneClickUrl: string;
  /** The page to choose at once, daily, weekly or paused for each follow; works without signing in. */
  preferencesUrl: string;
}

/** The e-mail a follower (or the person whose fit report the check verifies) gets when a fit is confirmed or fails. */
export function fitNewsMail(news: FitNews): OutgoingMail {
  const outcome = news.news === 'confirmed' ? 'confirmed it fits, test-fitted on the vehicle' : 'found that it does not fit';
  return composeMail(
    news.to,
    `${news.news === 'confirmed' ? 'Fit confirmed' : 'No fit'}: ${news.checkTitle}`,
    [
      `${news.workshopName} has ${outcome}: “${news.checkTitle}” in “${news.assemblyName}” (${news.buildTitle}).`,
      ...(news.reason ? [`Their note: ${news.reason}`] : []),
      ...(news.evidence.length ? [`Evidence: ${news.evidence.join('; ')}.`] : []),
      // A fit confirmed is a fit the reader may now make: where it is pressed or shrunk on, the usual caution goes with it.
      ...standardCautions(detectSafetyTopics([news.checkTitle, news.reason, ...news.evidence].join('\n')).filter((topic) => topic === 'pressing')).map(
        (caution) => `${caution.level}: ${caution.text}`,
      ),
      news.because.kind === 'follow'
        ? `You get this because you follow ${news.because.label}. To stop, open ${news.unsubscribe.pageUrl}`
        : `You get this because you sent a fit report that this check verifies. To stop news about your report, open ${news.unsubscribe.pageUrl}`,
      `Choose at once, a daily or weekly digest, or pause, for each thing you follow: ${news.unsubscribe.preferencesUrl}`,
    ],
    news.link,
    { 'List-Unsubscribe': `<${news.unsubscribe.oneClickUrl}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
  );
}
