// `npm run bench:playback`: frames per second of the playback with 50 carriers in this machine's
// Chromium. Serves the benchmark page with Vite, plays the recorded window at 60× and counts
// requestAnimationFrame callbacks over several seconds, several times; the median is compared with the
// 60 fps target and with the same page's frame rate while paused (the ratio shows the player's own
// cost, whatever the machine's load). Beside frames, the browser's CPU time per frame (every
// Chromium process: page, compositor, browser), playing against paused: that figure does not depend on
// how busy the machine is. Reported, not thrown: figures depend on the machine.
import { cpus, loadavg } from 'node:os';
import { chromium, type Browser } from 'playwright-core';
import { createServer } from 'vite';
import { CHROMIUM_PATH } from '../../tests/support/chromium-path';

const TARGET_FPS = 60;
const SECONDS = 4;
const RUNS = 5;

/**
 * Frames per second and the 95th-percentile frame time, counted in the page over `seconds`. Kept as
 * source text: tsx would otherwise add its own helpers to the function, which the page lacks.
 */
const countFrames = (seconds: number) => `new Promise((resolve) => {
  const times = [];
  const end = performance.now() + ${seconds * 1000};
  const tick = (now) => {
    times.push(now);
    if (now < end) return requestAnimationFrame(tick);
    const gaps = times.slice(1).map((t, i) => t - times[i]).sort((a, b) => a - b);
    resolve({ frames: times.length - 1, fps: (times.length - 1) / ((times[times.length - 1] - times[0]) / 1000), p95Ms: gaps[Math.floor(gaps.length * 0.95)] });
  };
  requestAnimationFrame(tick);
})`;

type FrameCount = { frames: number; fps: number; p95Ms: number };

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** CPU seconds used so far by every process of the browser. */
async function browserCpuSeconds(browser: Browser): Promise<number> {
  const session = await browser.newBrowserCDPSession();
  const info = (await session.send('SystemInfo.getProcessInfo')) as { processInfo: { cpuTime: number }[] };
  await session.detach();
  return info.processInfo.reduce((sum, p) => sum + p.cpuTime, 0);
}

/** Frames counted over SECONDS and the browser's CPU milliseconds per frame meanwhile. */
async function measure(browser: Browser, page: import('playwright-core').Page) {
  const before = await browserCpuSeconds(browser);
  const counted = await page.evaluate<FrameCount>(countFrames(SECONDS));
  const cpuMs = ((await browserCpuSeconds(browser)) - before) * 1000;
  return { ...counted, cpuMsPerFrame: cpuMs / counted.frames };
}

const server = await createServer({ server: { port: 0, host: '127.0.0.1', strictPort: false }, logLevel: 'error' });
await server.listen();
const address = server.httpServer?.address();
const port = typeof address === 'object' && address ? address.port : 0;
const browser = await chromium.launch({
  executablePath: CHROMIUM_PATH,
  headless: true,
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
});
try {
  const page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
  await page.goto(`http://127.0.0.1:${port}/src/bench/playback-bench.html`);
  await page.locator('[data-playback]').waitFor({ timeout: 120_000 });
  const paused: Awaited<ReturnType<typeof measure>>[] = [];
  const playing: Awaited<ReturnType<typeof measure>>[] = [];
  await page.locator('[data-playback-speed]').selectOption('60');
  for (let run = 0; run < RUNS; run++) {
    paused.push(await measure(browser, page));
    await page
      .locator('[data-playback-scrubber]')
      .fill(String(await page.locator('[data-playback-scrubber]').getAttribute('min')));
    await page.locator('[data-playback-toggle]').click();
    playing.push(await measure(browser, page));
    await page.locator('[data-playback-toggle]').click();
  }
  const paints: number[] = [];
  for (let run = 0; run < RUNS; run++) paints.push(await page.evaluate<number>('benchPaint(600)'));
  const paintMs = median(paints);
  const fps = median(playing.map((m) => m.fps));
  const pausedFps = median(paused.map((m) => m.fps));
  const cpuPlaying = median(playing.map((m) => m.cpuMsPerFrame));
  const cpuPaused = median(paused.map((m) => m.cpuMsPerFrame));
  const lines = [
    `playback benchmark: 50 carriers on 3 decks and the side elevation, 60× speed, ${RUNS} runs of ${SECONDS} s`,
    `  frames per second while playing: median ${fps.toFixed(1)} (runs ${playing.map((m) => m.fps.toFixed(1)).join(', ')}), 95th-percentile frame ${median(playing.map((m) => m.p95Ms)).toFixed(1)} ms`,
    `  frames per second while paused:  median ${pausedFps.toFixed(1)}; playing/paused ratio ${(fps / pausedFps).toFixed(2)}`,
    `  browser CPU per frame (all Chromium processes): playing ${cpuPlaying.toFixed(2)} ms, paused ${cpuPaused.toFixed(2)} ms; the playback's own ${(cpuPlaying - cpuPaused).toFixed(2)} ms`,
    `  player script alone: ${paintMs.toFixed(2)} ms per frame (${((paintMs / (1000 / TARGET_FPS)) * 100).toFixed(0)} % of a 60 fps frame), median of ${RUNS} × 600 frames`,
    `  machine load average while measuring: ${loadavg()[0].toFixed(1)} on ${cpus().length} cores`,
    `  target ${TARGET_FPS} fps: ${fps >= TARGET_FPS * 0.95 ? 'met' : 'MISSED'} (within 5 % counts as met: frame timing jitters on a shared machine)`,
  ];
  console.log(lines.join('\n'));
} finally {
  await browser.close();
  await server.close();
}
