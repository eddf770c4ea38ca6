// Removes the demo before a real deployment: every user of the demo domain (their sessions and memberships
// go with them) and each organisation that only demo users belonged to (with its projects, scenarios and
// runs). Organisations that real users also joined are kept.
//   LANEWRIGHT_DEMO=off npx tsx server/setup/remove-demo.ts
import { loadConfig } from '../config';
import { DEMO_EMAIL_DOMAIN } from '../db/seed/demo';
import { say } from './log';
import { prepareDatabase } from './prepare-database';
import { cleanUp, failAndExit } from './shutdown';

const DEMO_EMAILS = `%@${DEMO_EMAIL_DOMAIN}`;

async function main(): Promise<void> {
  const dataSource = await prepareDatabase({ seed: false });
  await dataSource.transaction(async (manager) => {
    // Wrapped in SELECT so the driver returns the count as a row rather than its DELETE result shape.
    const [{ n: organisations }] = await manager.query(
      `WITH gone AS (
         DELETE FROM organisations o
          WHERE EXISTS (SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id
                         WHERE m.organisation_id = o.id AND u.email LIKE $1)
            AND NOT EXISTS (SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id
                             WHERE m.organisation_id = o.id AND u.email NOT LIKE $1)
          RETURNING 1)
       SELECT count(*)::int AS n FROM gone`,
      [DEMO_EMAILS],
    );
    const [{ n: users }] = await manager.query(
      'WITH gone AS (DELETE FROM users WHERE email LIKE $1 RETURNING 1) SELECT count(*)::int AS n FROM gone',
      [DEMO_EMAILS],
    );
    say(`removed ${users} demo user(s) and ${organisations} organisation(s) that only demo users belonged to`);
  });
  if (loadConfig().LANEWRIGHT_DEMO !== 'off')
    say('start with LANEWRIGHT_DEMO=off from now on, or the next start seeds the demo again');
  await cleanUp();
}

main().catch(failAndExit);
