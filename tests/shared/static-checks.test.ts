// The whole tree type-checks and obeys the lint rules that hold the architecture (dependency
// direction, no import cycles, no DOM or Node globals in the engine), so a change that breaks
// either fails the test run rather than waiting for someone to run the commands by hand.
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));

function run(bin: string, args: string[]): Promise<{ code: number; output: string }> {
  return new Promise((resolve) => {
    execFile(`${root}node_modules/.bin/${bin}`, args, { cwd: root, maxBuffer: 16 * 1024 * 1024, env: { ...process.env, NO_COLOR: '1' } }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : 1) : 0;
      resolve({ code, output: `${stdout}${stderr}`.trim() });
    });
  });
}

describe('static checks over the whole tree', () => {
  it('type-checks with tsc --noEmit', { timeout: 300_000 }, async () => {
    const { code, output } = await run('tsc', ['--noEmit', '-p', '.']);
    expect(output).toBe('');
    expect(code).toBe(0);
  });

  it('passes ESLint, including the dependency-direction rules', { timeout: 300_000 }, async () => {
    const { code, output } = await run('eslint', ['.']);
    expect(output).toBe('');
    expect(code).toBe(0);
  });
});
