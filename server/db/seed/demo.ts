// The demo organisation: an invented valve-cartridge assembly plant with an owner, an engineer and a
// viewer, one project and two layouts made from the examples (demo-layouts.ts). Seeding is
// all-or-nothing and happens once: when the demo organisation exists, nothing is touched, so users'
// edits to demo data survive restarts.
import type { DataSource } from 'typeorm';
import type { Role } from '../../../shared/api/roles';
import { scenarioSchema } from '../../../shared/scenario/scenario';
import { recordAudit } from '../../audit/record-audit';
import { hashPassword } from '../../auth/password';
import { loadConfig, type ServerConfig } from '../../config';
import { createScenarioWithFirstRevision } from '../../scenarios/create-scenario';
import { MembershipEntity, OrganisationEntity, ProjectEntity, UserEntity } from '../entities';
import { DEMO_LAYOUTS } from './demo-layouts';

export const DEMO_ORGANISATION_ID = '5eed0000-0000-4000-8000-000000000001';
export const DEMO_PASSWORD = 'demo-password';
/** Every demo account's e-mail ends in this domain, which is how `remove-demo` finds them. */
export const DEMO_EMAIL_DOMAIN = 'demo.lanewright.test';
export const DEMO_ACCOUNTS: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: `owner@${DEMO_EMAIL_DOMAIN}`, name: 'Demo Owner', role: 'owner' },
  { email: `engineer@${DEMO_EMAIL_DOMAIN}`, name: 'Demo Engineer', role: 'engineer' },
  { email: `viewer@${DEMO_EMAIL_DOMAIN}`, name: 'Demo Viewer', role: 'viewer' },
];

function parseExample(name: string, example: unknown) {
  const parsed = scenarioSchema.safeParse(example);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`the demo scenario "${name}" does not match the scenario format: ${issues}`);
  }
  return parsed.data;
}

/** Seeds the demo unless the configuration turns it off (LANEWRIGHT_DEMO=off). */
export async function seedDemo(
  ds: DataSource,
  config: Pick<ServerConfig, 'LANEWRIGHT_DEMO'> = loadConfig(),
): Promise<void> {
  if (config.LANEWRIGHT_DEMO === 'off') return;
  if (await ds.getRepository(OrganisationEntity).existsBy({ id: DEMO_ORGANISATION_ID })) return;
  const documents = DEMO_LAYOUTS.map((s) => ({ ...s, document: parseExample(s.name, s.example) }));
  const passwordHash = await hashPassword(DEMO_PASSWORD);

  await ds.transaction(async (manager) => {
    // Another start may be seeding at the same moment; the lock makes the second one find the first's work.
    await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', ['lanewright-demo-seed']);
    if (await manager.getRepository(OrganisationEntity).existsBy({ id: DEMO_ORGANISATION_ID })) return;
    const users = manager.getRepository(UserEntity);
    const taken = await users.findBy(DEMO_ACCOUNTS.map((a) => ({ email: a.email })));
    if (taken.length > 0) {
      throw new Error(
        `cannot seed the demo: ${taken.map((u) => u.email).join(', ')} already belong(s) to other accounts; set LANEWRIGHT_DEMO=off`,
      );
    }
    const organisation = await manager
      .getRepository(OrganisationEntity)
      .save({ id: DEMO_ORGANISATION_ID, name: 'Demo valve-cartridge plant' });
    const accounts = [];
    for (const account of DEMO_ACCOUNTS) {
      const user = await users.save({ email: account.email, name: account.name, passwordHash });
      await manager
        .getRepository(MembershipEntity)
        .insert({ organisationId: organisation.id, userId: user.id, role: account.role });
      accounts.push(user);
    }
    const engineer = accounts[1];
    const project = await manager.getRepository(ProjectEntity).save({
      organisationId: organisation.id,
      name: 'Cartridge line layout study',
      description:
        'Invented demo: which layout reaches the takt for the VC-20 valve cartridge with the fewest carriers.',
      createdById: engineer.id,
    });
    for (const { name, description, document } of documents) {
      await createScenarioWithFirstRevision(manager, {
        projectId: project.id,
        name,
        description,
        document,
        message: 'Demo layout',
        createdById: engineer.id,
      });
    }
    await recordAudit(manager, {
      organisationId: organisation.id,
      actorId: null,
      action: 'create',
      entity: 'organisation',
      entityId: organisation.id,
      detail: { seeded: 'demo' },
    });
  });
}
