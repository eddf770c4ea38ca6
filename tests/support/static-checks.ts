// The type check, the lint and the format check as steps of `npm test` of their own, outside vitest, so the unit project
// stays fast. Each step counts as one test in the closing line: one passed, or one failed with the
// tool's output printed under its name.
import { execFile } from 'node:child_process';
import { join } from 'node:path';
import { say } from '../../server/setup/log';
import { projectRoot } from '../../server/setup/paths';

export interface StaticCheck {
  name: string;
  command: string;
  args: string[];
}

export const STATIC_CHECKS: StaticCheck[] = [
  { name: 'type check', command: 'tsc', args: ['--noEmit', '-p', '.'] },
  { name: 'lint', command: 'eslint', args: ['.'] },
  // Lists files that differ from the Prettier settings; silent when the tree is formatted.
  { name: 'format', command: 'prettier', args: ['--list-different', '.'] },
];

export interface StaticCheckResult {
  check: StaticCheck;
  ok: boolean;
  seconds: number;
  output: string;
}

function runCheck(check: StaticCheck): Promise<StaticCheckResult> {
  const started = Date.now();
  const bin = join(projectRoot, 'node_modules', '.bin', check.command);
  return new Promise((resolve) => {
    execFile(
      bin,
      check.args,
      { cwd: projectRoot, maxBuffer: 64 * 1024 * 1024, env: { ...process.env, NO_COLOR: '1' } },
      (error, stdout, stderr) => {
        const output = `${stdout}${stderr}`.trim();
        resolve({
          check,
          ok: !error && output === '',
          seconds: (Date.now() - started) / 1000,
          output: output || (error?.message ?? ''),
        });
      },
    );
  });
}

/** Starts every check at once; the result lines are printed by reportStaticChecks. */
export function startStaticChecks(): Promise<StaticCheckResult[]> {
  return Promise.all(STATIC_CHECKS.map(runCheck));
}

/** Prints one clear line per check (and a failing check's output); returns the counts for the closing line. */
export function reportStaticChecks(results: StaticCheckResult[]): { passed: number; failed: number } {
  for (const { check, ok, seconds, output } of results) {
    const what = `${check.name} (${[check.command, ...check.args].join(' ')})`;
    if (ok) {
      say(`static check passed: ${what}, ${seconds.toFixed(0)} s`);
    } else {
      say(`static check FAILED: ${what}, ${seconds.toFixed(0)} s:`);
      console.log(output);
    }
  }
  const passed = results.filter((result) => result.ok).length;
  return { passed, failed: results.length - passed };
}
