import type { GuideStep } from './entities/guide-step.entity';
import type { Guide } from './entities/guide.entity';
import { contentHash, guideContent } from './guide-content';

const guide = {
  title: 'T',
  slug: 't',
  summary: '',
  footageId: null,
  assemblyId: null,
  safetyTopics: [],
  tools: [],
  consumables: [],
  skillLevel: null,
  estimatedMinutes: null,
} as unknown as Guide;
const step = { id: 's1', position: 1, title: 'S', body: '', footageId: null, startMs: null, endMs: null, cautionLevel: null, cautionText: '', estimatedMinutes: null } as unknown as GuideStep;

describe('guide content', () => {
  it('leaves out a skill level and times not given, so revisions published before they existed keep their hash', () => {
    const content = guideContent(guide, [step], []);
    expect(content).not.toHaveProperty('skillLevel');
    expect(content).not.toHaveProperty('estimatedMinutes');
    expect(content.steps[0]).not.toHaveProperty('estimatedMinutes');
    // The content as it was stored before these fields: the same hash.
    const before = { title: 'T', slug: 't', summary: '', footageId: null, assemblyId: null, safetyTopics: [], tools: [], consumables: [], stepMarks: [], steps: [{ id: 's1', position: 1, title: 'S', body: '', footageId: null, startMs: null, endMs: null, caution: null }] };
    expect(contentHash(content)).toBe(contentHash(before));
  });

  it('carries them when given, and a change of them changes the hash', () => {
    const given = guideContent({ ...guide, skillLevel: 'bench_starter', estimatedMinutes: 45 } as Guide, [{ ...step, estimatedMinutes: 15 } as GuideStep], []);
    expect(given).toMatchObject({ skillLevel: 'bench_starter', estimatedMinutes: 45, steps: [{ estimatedMinutes: 15 }] });
    expect(contentHash(given)).not.toBe(contentHash(guideContent(guide, [step], [])));
  });
});
