// `npm run bench:playback`: frames per second of the playback with 50 carriers in this machine's
// Chromium. Serves the benchmark page with Vite, plays the recorded window at 60× and counts
// requestAnimationFrame callbacks over several seconds, three times; the median is compared with the
// 60 fps target and with the same page's frame rate while paused (the ratio shows the player's own
// cost, whatever the machine's load). Reported, not thrown: figures depend on the machine.
import { cpus, loadavg } from 'node:os';
import { chromium } from 'playwright-core';
import { createServer } from 'vite';
import { CHROMIUM_PATH } from '../../tests/support/chromium-path';

const TARGET_FPS = 60;
const SECONDS = 4;
const RUNS = 3;

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
    resolve({ fps: (times.length - 1) / ((times[times.length - 1] - times[0]) / 1000), p95Ms: gaps[Math.floor(gaps.length * 0.95)] });
  };
  requestAnimationFrame(tick);
})`;

type FrameCount = { fps: number; p95Ms: number };

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

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
  const carriers = await page.locator('[data-pb-carrier]').count();
  const paused: number[] = [];
  const playing: number[] = [];
  const p95: number[] = [];
  await page.locator('[data-playback-speed]').selectOption('60');
  for (let run = 0; run < RUNS; run++) {
    paused.push((await page.evaluate<FrameCount>(countFrames(SECONDS))).fps);
    await page
      .locator('[data-playback-scrubber]')
      .fill(String(await page.locator('[data-playback-scrubber]').getAttribute('min')));
    await page.locator('[data-playback-toggle]').click();
    const measured = await page.evaluate<FrameCount>(countFrames(SECONDS));
    await page.locator('[data-playback-toggle]').click();
    playing.push(measured.fps);
    p95.push(measured.p95Ms);
  }
  const paints: number[] = [];
  for (let run = 0; run < RUNS; run++) paints.push(await page.evaluate<number>('benchPaint(600)'));
  const paintMs = median(paints);
  const fps = median(playing);
  const lines = [
    `playback benchmark: ${carriers / 4} carriers on 3 decks and the side elevation (${carriers} marks), 60× speed, ${RUNS} runs of ${SECONDS} s`,
    `  frames per second while playing: median ${fps.toFixed(1)} (runs ${playing.map((x) => x.toFixed(1)).join(', ')}), 95th-percentile frame ${median(p95).toFixed(1)} ms`,
    `  frames per second while paused:  median ${median(paused).toFixed(1)}; playing/paused ratio ${(fps / median(paused)).toFixed(2)}`,
    `  painter alone: ${paintMs.toFixed(2)} ms per frame (${((paintMs / (1000 / TARGET_FPS)) * 100).toFixed(0)} % of a 60 fps frame), median of 3 × 600 frames`,
    `  machine load average while measuring: ${loadavg()[0].toFixed(1)} on ${cpus().length} cores`,
    `  target ${TARGET_FPS} fps: ${fps >= TARGET_FPS * 0.95 ? 'met' : 'MISSED'} (within 5 % counts as met: frame timing jitters on a shared machine)`,
  ];
  console.log(lines.join('\n'));
} finally {
  await browser.close();
  await server.close();
}
