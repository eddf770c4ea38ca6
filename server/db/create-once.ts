// Creating with a client-chosen key: a retry after a lost answer finds the first row instead of making a
// second. Two attempts racing past the lookup meet the unique constraint; the loser answers like a retry.
import { isUniqueViolation } from './query-errors';

export async function createOnce<T>(
  find: () => Promise<T | null>,
  create: () => Promise<T>,
): Promise<{ value: T; created: boolean }> {
  const existing = await find();
  if (existing) return { value: existing, created: false };
  try {
    return { value: await create(), created: true };
  } catch (error) {
    const winner = isUniqueViolation(error) ? await find() : null;
    if (!winner) throw error;
    return { value: winner, created: false };
  }
}
