import { fitNewsMail, type FitNews } from './fit-news-mails';

const news: FitNews = {
  to: 'reader@example.test',
  news: 'confirmed',
  checkTitle: 'Coupler seats on the shaft',
  reason: 'Seated fully',
  evidence: ['a reading of 15.006 mm'],
  workshopName: 'Harrow Lane Garage',
  assemblyName: '21-tooth coupler stack',
  buildTitle: 'Motor-to-gearbox coupler',
  link: { label: 'See the verified-fit checklist', url: 'https://fitwright.test/guides/harrow/coupler#checklist' },
  because: { kind: 'follow', label: 'Motor-to-gearbox coupler' },
  unsubscribe: {
    pageUrl: 'https://fitwright.test/unsubscribe?token=abc',
    oneClickUrl: 'https://fitwright.test/api/follows/unsubscribe?token=abc',
    preferencesUrl: 'https://fitwright.test/mail-preferences?token=abc',
  },
};

describe('fitNewsMail', () => {
  // RFC 8058 §3.1: List-Unsubscribe holds one HTTPS URI in angle brackets, List-Unsubscribe-Post exactly "List-Unsubscribe=One-Click".
  it.each([
    ['a follow', news.because],
    ['a fit report', { kind: 'report' } as const],
  ])('carries the one-click unsubscribe headers and the page link for mail sent because of %s', (_why, because) => {
    const mail = fitNewsMail({ ...news, because });
    expect(mail.headers).toEqual({
      'List-Unsubscribe': '<https://fitwright.test/api/follows/unsubscribe?token=abc>',
      'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
    });
    expect(mail.text).toContain('open https://fitwright.test/unsubscribe?token=abc');
    expect(mail.html).toContain('https://fitwright.test/unsubscribe?token=abc');
    expect(mail.text).toContain('https://fitwright.test/mail-preferences?token=abc');
  });

  it('says why the mail came', () => {
    expect(fitNewsMail(news).text).toContain('You get this because you follow Motor-to-gearbox coupler. To stop, open ');
    expect(fitNewsMail({ ...news, because: { kind: 'report' } }).text).toContain(
      'You get this because you sent a fit report that this check verifies. To stop news about your report, open ',
    );
  });

  it('carries the usual caution where the news talks about pressing or heating, and none otherwise', () => {
    const pressed = fitNewsMail({ ...news, checkTitle: 'Pilot bearing pressed in', reason: 'Heated the coupler hub and pressed the bearing in' }).text;
    expect(pressed).toContain('WARNING: Presses and pullers store great force');
    expect(pressed).toContain('heat-resistant gloves');
    expect(fitNewsMail(news).text).not.toMatch(/WARNING|DANGER/);
  });
});
