// What the server's benchmarks share: positive numeric options as `--name=value` command-line flags (so
// nothing reads the environment here) and the median of a round's figures.

export function numberOption(name: string, fallback: number): number {
  const flag = process.argv.find((arg) => arg.startsWith(`--${name}=`));
  const value = flag ? Number(flag.slice(name.length + 3)) : fallback;
  if (!Number.isFinite(value) || value <= 0) throw new Error(`--${name} must be a positive number (got ${flag})`);
  return value;
}

export const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
