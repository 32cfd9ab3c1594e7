import { fitReportArrivedMail } from './fit-report-mails';

describe('fitReportArrivedMail', () => {
  const input = {
    to: 'owner@example.test',
    workshopName: 'Harrow Lane Garage',
    guideTitle: 'Motor-to-gearbox coupler',
    reporterName: 'Rae Okafor',
    outcome: 'no_fit' as const,
    parts: 'HL-21C coupler on a 5-speed input shaft',
    vehicle: '1986 compact pickup',
    reviewUrl: 'https://studio.example.test/workshops/w1/fit-reports',
    links: {
      pageUrl: 'https://studio.example.test/unsubscribe?token=t1',
      oneClickUrl: 'https://studio.example.test/api/follows/unsubscribe?token=t1',
      preferencesUrl: 'https://studio.example.test/mail-preferences?token=t1',
    },
  };

  it('says who claimed what, on which guide, with the link to review it', () => {
    const mail = fitReportArrivedMail(input);
    expect(mail.to).toBe('owner@example.test');
    expect(mail.subject).toBe('New fit report on “Motor-to-gearbox coupler”: it did not fit');
    expect(mail.text).toContain('Rae Okafor sent Harrow Lane Garage a fit report from the guide “Motor-to-gearbox coupler”: it did not fit.');
    expect(mail.text).toContain('Parts: HL-21C coupler on a 5-speed input shaft');
    expect(mail.text).toContain('Vehicle: 1986 compact pickup');
    expect(mail.text).toContain('Review the fit report: https://studio.example.test/workshops/w1/fit-reports');
  });

  it('carries the stop link, the preferences link and the one-click List-Unsubscribe headers (RFC 8058)', () => {
    const mail = fitReportArrivedMail(input);
    expect(mail.text).toContain('To stop mail about new fit reports, open https://studio.example.test/unsubscribe?token=t1');
    expect(mail.text).toContain('https://studio.example.test/mail-preferences?token=t1');
    expect(mail.headers).toEqual({
      'List-Unsubscribe': '<https://studio.example.test/api/follows/unsubscribe?token=t1>',
      'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click',
    });
  });

  it('leaves out an empty vehicle and escapes the reader’s words in the HTML part', () => {
    const mail = fitReportArrivedMail({ ...input, outcome: 'fit', vehicle: '', parts: '<b>RT-1</b> & spacer' });
    expect(mail.subject).toMatch(/: it fit$/);
    expect(mail.text).not.toContain('Vehicle:');
    expect(mail.html).toContain('Parts: &lt;b&gt;RT-1&lt;/b&gt; &amp; spacer');
  });
});
