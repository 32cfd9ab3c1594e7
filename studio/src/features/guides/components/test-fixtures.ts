import type { Guide, GuideStep } from '../api/types';

/** Invented guide data for the component tests (Harrow Lane Garage's coupler build). */
export function aStep(overrides: Partial<GuideStep> & Pick<GuideStep, 'id' | 'position' | 'title'>): GuideStep {
  return { body: '', footageId: null, startMs: null, endMs: null, caution: null, estimatedMinutes: null, marks: [], ...overrides };
}

export function aGuide(overrides: Partial<Guide> = {}): Guide {
  return {
    id: 'g1',
    workshopId: 'w1',
    buildId: 'b1',
    title: 'Fitting the motor-to-gearbox coupler',
    slug: 'fitting-the-motor-to-gearbox-coupler',
    summary: '<p>Couple the motor to the original gearbox.</p>',
    footageId: null,
    assemblyId: null,
    safetyTopics: [],
    detectedSafetyTopics: [],
    tools: [],
    consumables: [],
    skillLevel: null,
    estimatedMinutes: null,
    status: 'draft',
    hasUnpublishedChanges: false,
    publishedRevision: null,
    publicPath: null,
    steps: [],
    createdAt: '2026-03-02T10:00:00.000Z',
    updatedAt: '2026-03-02T10:00:00.000Z',
    ...overrides,
  };
}
