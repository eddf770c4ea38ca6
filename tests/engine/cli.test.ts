import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseArgs, UsageError } from '../../workers/cli/args';
import { EXAMPLES_DIR } from './helpers';

const ROOT = join(__dirname, '../..');

function simulate(...args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', join(ROOT, 'workers/cli/simulate.ts'), ...args], {
    cwd: ROOT,
    encoding: 'utf8',
    timeout: 60_000,
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('simulate command line', () => {
  it('parses flags into run settings', () => {
    expect(
      parseArgs([
        '--scenario',
        'a.json',
        '--replications',
        '3',
        '--seed',
        'x7',
        '--hours',
        '2',
        '--warmup-minutes',
        '15',
        '--carriers',
        '9',
        '--json',
      ]),
    ).toEqual({
      kind: 'run',
      scenario: 'a.json',
      json: true,
      settings: { replications: 3, seed: 'x7', hours: 2, warmupMinutes: 15, carriers: 9 },
    });
    expect(() => parseArgs(['--scenario', 'a.json', '--hours', 'soon'])).toThrow(UsageError);
    expect(() => parseArgs(['--hours', '2'])).toThrow('--scenario FILE is required');
  });

  it('prints one JSON object with the headline numbers and exits 0', () => {
    const r = simulate(
      '--scenario',
      join(EXAMPLES_DIR, 'stacked-loop.json'),
      '--replications',
      '2',
      '--hours',
      '0.25',
      '--warmup-minutes',
      '2',
      '--json',
    );
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as Record<string, unknown>;
    for (const key of [
      'throughputPerHour',
      'taktSeconds',
      'annualOutput',
      'stations',
      'leadTimeSeconds',
      'wip',
      'events',
      'engineVersion',
    ])
      expect(out).toHaveProperty(key);
    expect(out.throughputPerHour).toHaveProperty('ciLow');
  }, 60_000);

  it('exits 2 with the field path for an invalid scenario, without a stack trace', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lanewright-cli-'));
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify({ schemaVersion: 1, name: 'x', calendar: {} }));
    const r = simulate('--scenario', file);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/track: /);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  }, 60_000);

  it('exits 2 for a missing file, bad JSON and an unknown flag', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lanewright-cli-'));
    const broken = join(dir, 'broken.json');
    writeFileSync(broken, '{ "schemaVersion": 1, ');
    for (const args of [['--scenario', join(dir, 'none.json')], ['--scenario', broken], ['--frobnicate']]) {
      const r = simulate(...args);
      expect(r.status).toBe(2);
      expect(r.stderr.length).toBeGreaterThan(0);
    }
  }, 60_000);

  it('prints the scenario JSON Schema', () => {
    const r = simulate('--schema');
    expect(r.status).toBe(0);
    const schema = JSON.parse(r.stdout) as { properties: Record<string, unknown> };
    expect(Object.keys(schema.properties)).toEqual(
      expect.arrayContaining(['schemaVersion', 'lanes', 'transfers', 'steps', 'carriers', 'calendar']),
    );
  }, 60_000);
  it('prints a readable table with the four transfer shares, aligned under their headings', () => {
    const r = simulate(
      '--scenario',
      join(EXAMPLES_DIR, 'stacked-loop.json'),
      '--replications',
      '1',
      '--hours',
      '0.25',
      '--warmup-minutes',
      '2',
    );
    expect(r.status).toBe(0);
    const lines = r.stdout.split('\n');
    const header = lines.findIndex((l) => l.startsWith('transfer'));
    expect(lines[header]).toMatch(/^transfer\s+carry\s+return\s+blocked\s+idle\s+busy\s+queue$/);
    const row = lines[header + 1].trim().split(/\s+/);
    const [carry, ret, blocked, idle, busy] = row.slice(1, 6).map((x) => Number.parseFloat(x));
    expect(carry + ret + blocked + idle).toBeCloseTo(100, 0);
    expect(busy).toBeCloseTo(carry + ret, 0);
    expect(r.stdout).toMatch(/^breaks\s+stop manual stations only$/m);
  });
});
