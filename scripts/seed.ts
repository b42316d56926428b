/** Seed the demo (invented data) into DATABASE_URL; idempotent. See db/seed-demo.ts. */
import { closeDb } from '../db';
import { DEMO_TEAM, seedDemo } from '../db/seed-demo';

seedDemo()
  .then(({ created }) => console.log(`[zonewright] demo seed: ${created} new account(s); demo team "${DEMO_TEAM.name}"`))
  .catch((error: unknown) => {
    console.error(`[zonewright] seeding failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
