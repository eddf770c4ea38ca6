// `npm run migrate`: applies pending migrations to DATABASE_URL, or to database `lanewright` on the local
// cluster (started for the occasion and stopped again if it was not running).
import { prepareDatabase } from './prepare-database';
import { cleanUp, failAndExit } from './shutdown';

prepareDatabase({ seed: false })
  .then(() => cleanUp())
  .catch(failAndExit);
