import type { Follow, FollowTargets } from '../api/queries';

/** Harrow Lane Garage's demo guide as the follows routes describe it (invented). */
export const testTargets: FollowTargets = {
  workshop: { id: 'w1', label: 'Harrow Lane Garage' },
  build: { id: 'b1', label: 'Motor-to-gearbox coupler' },
  assembly: { id: 'a1', label: '21-tooth coupler stack' },
};

export const signedInUser = {
  id: 'u1',
  email: 'rowan@example.test',
  displayName: 'Rowan Teague',
  isAdmin: false,
  preferredUnits: 'metric',
  emailVerified: true,
};

export function testFollow(overrides: Partial<Follow> = {}): Follow {
  return {
    id: 'f1',
    targetKind: 'assembly',
    targetId: 'a1',
    label: '21-tooth coupler stack',
    delivery: 'at_once',
    workshop: { name: 'Harrow Lane Garage', slug: 'harrow-lane-garage' },
    createdAt: '2026-03-04T10:00:00.000Z',
    ...overrides,
  };
}
