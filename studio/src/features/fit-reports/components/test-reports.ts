import type { FitReport } from '../api/queries';

/** Invented reports about Harrow Lane Garage's demo build, for component tests. */
export function testReport(overrides: Partial<FitReport> = {}): FitReport {
  return {
    id: 'r1',
    outcome: 'fit',
    parts: 'HL-2107 coupler (Brackwater Drive) on the original gearbox input shaft',
    vehicle: '1984 compact pickup, 4x2',
    notes: 'Slid on by hand after deburring the spline ends.',
    status: 'new',
    creatorNote: '',
    fitCheck: null,
    guide: { title: 'Fitting the motor-to-gearbox coupler', path: '/guides/harrow-lane-garage/motor-to-gearbox-coupler' },
    build: { id: 'b1', title: 'Motor-to-gearbox coupler' },
    workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane-garage' },
    reporter: { displayName: 'Morgan Tull' },
    photos: [],
    createdAt: '2026-03-04T10:00:00.000Z',
    updatedAt: '2026-03-04T10:00:00.000Z',
    ...overrides,
  };
}

export const signedInUser = {
  id: 'u1',
  email: 'morgan@example.test',
  displayName: 'Morgan Tull',
  isAdmin: false,
  preferredUnits: 'metric',
  emailVerified: true,
};

/** A file of `bytes` bytes (the content does not matter to the browser-side checks). */
export function fakeFile(name: string, type: string, bytes = 2_000): File {
  return new File([new Uint8Array(bytes)], name, { type });
}
