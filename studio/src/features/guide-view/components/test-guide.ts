import type { StubRoute } from '@/testing/api-stub';
import type { CueWindow } from '../api/queries';
import type { Cue, PublishedGuide } from '../api/types';

/** The test guide's transcript, as the public cues route gives it a window at a time (never in the guide's answer). */
export const TEST_CUES: Cue[] = [
  { startMs: 0, endMs: 4_000, text: 'First we lift the cab onto stands.' },
  { startMs: 8_000, endMs: 11_000, text: 'The coupler slides on the twenty-one tooth spline.' },
  { startMs: 12_000, endMs: 15_000, text: 'Spigot bore is fifteen thousandths over.' },
];

/** An invented published guide (Harrow Lane Garage's demo build) for component tests. */
export function testGuide(overrides: Partial<PublishedGuide> = {}): PublishedGuide {
  return {
    workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane-garage' },
    guide: {
      title: 'Fitting the motor-to-gearbox coupler',
      slug: 'motor-to-gearbox-coupler',
      summary: '<p>Couple the motor to the original gearbox <strong>without re-machining</strong>.</p>',
      buildTitle: 'Motor-to-gearbox coupler',
      vehicle: '1980s compact pickup, electric conversion',
      tools: ['Trolley jack', 'Axle stands', 'Micrometer 0–25 mm'],
      consumables: ['Thread locker, medium strength'],
      safetyTopics: ['lifting', 'high_voltage'],
      skillLevel: 'shop_regular',
      estimatedMinutes: 150,
    },
    revision: { number: 3, publishedAt: '2026-03-02T10:00:00.000Z', note: 'Longer driveshaft' },
    cautions: [
      { level: 'WARNING', topic: 'lifting', text: 'Support the vehicle on stands; never work under a jack alone.' },
      { level: 'DANGER', topic: 'high_voltage', text: 'Isolate the traction battery and prove it dead before touching orange cables.' },
    ],
    disclaimer:
      'Fitwright does not replace the vehicle manufacturer’s service information, local regulations or a licensed professional’s judgement.',
    footage: {
      id: 'f1',
      title: 'Coupler test fit',
      durationMs: 20_000,
      videoUrl: '/api/guides/harrow-lane-garage/motor-to-gearbox-coupler/video',
      posterUrl: null,
      captionsUrl: '/api/guides/harrow-lane-garage/motor-to-gearbox-coupler/captions',
      // The web renditions are not made yet: the video plays the progressive file.
      hlsUrl: null,
      mp4Url: null,
      thumbnailsUrl: null,
      waveformUrl: null,
      displayWidth: null,
      displayHeight: null,
    },
    steps: [
      { id: 's1', position: 1, title: 'Lift the cab', body: '<p>Jack at the marked points.</p>', footageId: 'f1', startMs: 0, endMs: null, caution: null, estimatedMinutes: 20 },
      {
        id: 's2',
        position: 2,
        title: 'Slide the coupler on',
        body: '',
        footageId: 'f1',
        startMs: 8_000,
        endMs: null,
        caution: { level: 'CAUTION', text: 'The coupler edge is sharp; wear gloves.' },
        estimatedMinutes: null,
      },
      { id: 's3', position: 3, title: 'Torque the bolts', body: '', footageId: null, startMs: null, endMs: null, caution: null, estimatedMinutes: 45 },
    ],
    parts: [{ partNumber: 'HL-2107', maker: 'Brackwater Drive', title: 'Coupler, 21-tooth', category: 'coupler', position: 'motor side' }],
    checklist: {
      assemblyName: '21-tooth coupler',
      verdict: 'bench_pass',
      checks: [
        {
          id: 'c1',
          title: 'Spline: coupler to motor shaft',
          state: 'confirmed',
          required: true,
          detail: '21 teeth, 16/32 pitch on both',
          confirmedAt: '2026-03-01T09:00:00.000Z',
          confirmedBy: null,
          evidence: [{ kind: 'mark', label: 'Slides on by hand', startMs: 9_000 }],
        },
        { id: 'c2', title: 'Fit: pilot bearing', state: 'bench_pass', required: true, detail: null, confirmedAt: null, confirmedBy: null, evidence: [] },
        { id: 'c3', title: 'Length: driveshaft window', state: 'open', required: true, detail: null, confirmedAt: null, confirmedBy: null, evidence: [] },
        { id: 'c4', title: 'Fit: adapter spigot', state: 'no_fit', required: false, detail: null, confirmedAt: null, confirmedBy: null, evidence: [] },
        { id: 'c5', title: 'Seal diameter', state: 'retired', required: false, detail: null, confirmedAt: null, confirmedBy: null, evidence: [] },
      ],
    },
    marks: [
      // "fifteen thousandths" in the cue above = 15 × 0.001 in = 0.015 in.
      { id: 'm1', kind: 'measurement', startMs: 12_500, endMs: null, label: 'Spigot 0.015 in over', stepId: 's2', fitCheckId: null },
      { id: 'm2', kind: 'check_evidence', startMs: 9_000, endMs: null, label: 'Slides on by hand', stepId: null, fitCheckId: 'c1' },
    ],
    followTargets: {
      workshop: { id: 'w1', label: 'Harrow Lane Garage' },
      build: { id: 'b1', label: 'Motor-to-gearbox coupler' },
      assembly: { id: 'a1', label: '21-tooth coupler' },
    },
    ...overrides,
  };
}

/** The public cues route over `cues`, answering a window by time (fromMs, toMs) or by position (fromIndex, limit) as the API does. */
export function cueWindowRoute(path: RegExp, cues: readonly Cue[]): StubRoute {
  const indexed = cues.map((cue, index) => ({ index, ...cue }));
  return {
    path,
    body: ({ url }: { url: URL }): CueWindow => {
      const number = (name: string) => Number(url.searchParams.get(name));
      if (url.searchParams.has('fromMs')) {
        return { total: indexed.length, cues: indexed.filter((cue) => cue.endMs > number('fromMs') && cue.startMs < number('toMs')).slice(0, 500) };
      }
      const fromIndex = number('fromIndex');
      return { total: indexed.length, cues: indexed.slice(fromIndex, fromIndex + (number('limit') || 100)) };
    },
  };
}
