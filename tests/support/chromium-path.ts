// Debian's Chromium, which the browser tests drive through playwright-core (no browser download).
import { testEnv } from './test-env';

export const CHROMIUM_PATH = testEnv().LANEWRIGHT_CHROMIUM;
