import { DataSource } from 'typeorm';
import { hashPassword } from '../../auth/password-hasher';
import { newId } from '../../common/database/columns';
import type { MemberRole } from '../../common/types/access-context';
import { User } from '../../users/entities/user.entity';
import { WorkshopMember } from '../../workshops/entities/workshop-member.entity';
import { Workshop } from '../../workshops/entities/workshop.entity';

/**
 * The demo scenario's people (all invented; DESIGN.md, "Demo scenario"). Every demo account signs in
 * with DEMO_PASSWORD; README.md lists them.
 */
export const DEMO_PASSWORD = 'harrow-lane-demo';

export const DEMO_WORKSHOP = {
  slug: 'harrow-lane-garage',
  name: 'Harrow Lane Garage',
  description:
    'A two-bay shop converting a 1980s compact pickup to electric drive, one verified fit at a time. (An invented demo workshop.)',
};

export const DEMO_PEOPLE = {
  owner: { email: 'rowan@harrow-lane.example', displayName: 'Rowan Avery', role: 'owner of Harrow Lane Garage' },
  editor: { email: 'sam@harrow-lane.example', displayName: 'Sam Okafor', role: 'editor of Harrow Lane Garage' },
  follower: { email: 'priya@pickup-owners.example', displayName: 'Priya Lindqvist', role: 'follower (no workshop)' },
  admin: { email: 'admin@fitwright.example', displayName: 'Morgan Hale', role: 'site admin' },
} as const;

/** The ids the rest of the demo data hangs off (the fit data uses the workshop and its owner). */
export interface DemoAccounts {
  workshopId: string;
  ownerId: string;
  editorId: string;
  followerId: string;
  adminId: string;
}

/**
 * Creates the demo people and workshop when missing; safe to run on every start. Existing rows are left
 * alone (a changed demo password stays changed), except that memberships and the admin flag are ensured.
 */
export async function loadDemoAccounts(dataSource: DataSource): Promise<DemoAccounts> {
  return dataSource.transaction(async (manager) => {
    const users = manager.getRepository(User);
    let passwordHash: string | undefined;
    const ensureUser = async (person: { email: string; displayName: string }, isAdmin = false): Promise<string> => {
      const existing = await users.findOneBy({ email: person.email });
      if (existing) {
        if (isAdmin && !existing.isAdmin) await users.update({ id: existing.id }, { isAdmin: true });
        return existing.id;
      }
      passwordHash ??= await hashPassword(DEMO_PASSWORD);
      const user = users.create({
        id: newId(),
        email: person.email,
        passwordHash,
        displayName: person.displayName,
        preferredUnits: 'metric',
        emailVerifiedAt: new Date(),
        isAdmin,
        disabledAt: null,
      });
      await users.insert(user);
      return user.id;
    };

    const ownerId = await ensureUser(DEMO_PEOPLE.owner);
    const editorId = await ensureUser(DEMO_PEOPLE.editor);
    const followerId = await ensureUser(DEMO_PEOPLE.follower);
    const adminId = await ensureUser(DEMO_PEOPLE.admin, true);
    // The owner measures in inches, the editor in millimetres: the demo shows both displays.
    await users.update({ id: ownerId, preferredUnits: 'metric' }, { preferredUnits: 'inch' });

    const workshops = manager.getRepository(Workshop);
    let workshop = await workshops.findOneBy({ slug: DEMO_WORKSHOP.slug });
    if (!workshop) {
      workshop = workshops.create({ id: newId(), ...DEMO_WORKSHOP, logoKey: null, disabledAt: null });
      await workshops.insert(workshop);
    }

    const members = manager.getRepository(WorkshopMember);
    const ensureMember = async (userId: string, role: MemberRole) => {
      if (await members.existsBy({ workshopId: workshop.id, userId })) return;
      await members.insert(members.create({ id: newId(), workshopId: workshop.id, userId, role }));
    };
    await ensureMember(ownerId, 'owner');
    await ensureMember(editorId, 'editor');

    return { workshopId: workshop.id, ownerId, editorId, followerId, adminId };
  });
}

/** The lines `npm start` prints so a newcomer can sign in at once. */
export function demoSignInLines(): string[] {
  return [
    `demo sign-ins (password for all: ${DEMO_PASSWORD}):`,
    ...Object.values(DEMO_PEOPLE).map((person) => `  ${person.email.padEnd(30)} ${person.displayName}, ${person.role}`),
  ];
}
