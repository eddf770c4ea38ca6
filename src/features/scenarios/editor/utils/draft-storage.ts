// An unsaved draft survives a reload: it is kept in sessionStorage per scenario (this tab only, so two
// tabs never fight over one draft) and removed when it is saved or discarded.
import type { ScenarioInput } from '../../../../../shared/scenario/scenario';

export interface StoredDraft {
  baseRevisionNumber: number;
  document: ScenarioInput;
  storedAt: string;
}

const keyOf = (scenarioId: string) => `lanewright:draft:${scenarioId}`;

export function readDraft(scenarioId: string): StoredDraft | null {
  try {
    const text = window.sessionStorage.getItem(keyOf(scenarioId));
    if (!text) return null;
    const value = JSON.parse(text) as Partial<StoredDraft>;
    if (typeof value.baseRevisionNumber !== 'number' || typeof value.document !== 'object' || value.document === null)
      return null;
    return {
      baseRevisionNumber: value.baseRevisionNumber,
      document: value.document,
      storedAt: String(value.storedAt ?? ''),
    };
  } catch {
    return null;
  }
}

export function writeDraft(scenarioId: string, draft: Omit<StoredDraft, 'storedAt'>): void {
  try {
    window.sessionStorage.setItem(keyOf(scenarioId), JSON.stringify({ ...draft, storedAt: new Date().toISOString() }));
  } catch {
    // Storage full or disabled: the draft still lives in the form, only a reload would lose it.
  }
}

export function clearDraft(scenarioId: string): void {
  try {
    window.sessionStorage.removeItem(keyOf(scenarioId));
  } catch {
    // Nothing stored, nothing to remove.
  }
}
