// Debian's Chromium, which the browser tests drive through playwright-core (no browser download).
export const CHROMIUM_PATH = process.env.LANEWRIGHT_CHROMIUM ?? '/usr/bin/chromium';
