// A run's name, linking to its results; people allowed to can rename it in place (Enter saves,
// Escape leaves it as it was).
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { nameSchema } from '../../../../shared/api/common';
import type { RunListItem } from '../../../../shared/api/runs';
import { Button } from '../../../components/ui/button';
import { sentenceFor } from '../../../lib/form-errors';
import { useRenameRun } from '../api/rename-run';

export function RunNameCell({ run, mayRename }: { run: RunListItem; mayRename: boolean }) {
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState(run.name);
  const [problem, setProblem] = useState<string | null>(null);
  const rename = useRenameRun();

  const stop = () => {
    setEditing(false);
    setProblem(null);
    setDraft(run.name);
  };
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const parsed = nameSchema.safeParse(draft);
    if (!parsed.success) return setProblem(sentenceFor('The name', parsed.error.issues[0]?.message ?? 'is not valid'));
    try {
      await rename.mutateAsync({ id: run.id, name: parsed.data });
      setEditing(false);
      setProblem(null);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The run could not be renamed.');
    }
  };

  if (!editing) {
    return (
      <div className="flex flex-wrap items-center gap-x-2">
        <Link className="font-semibold text-accent-strong underline-offset-4 hover:underline" to={`/runs/${run.id}`}>
          {run.name}
        </Link>
        {mayRename && (
          <button
            type="button"
            className="text-xs text-ink-soft underline underline-offset-2 hover:text-ink"
            aria-label={`Rename ${run.name}`}
            onClick={() => setEditing(true)}
          >
            Rename
          </button>
        )}
      </div>
    );
  }
  return (
    <form className="flex flex-col gap-1" aria-label={`Rename ${run.name}`} onSubmit={(event) => void submit(event)}>
      <div className="flex flex-wrap items-center gap-2">
        <input
          aria-label="New run name"
          aria-invalid={problem ? true : undefined}
          autoFocus
          className="min-w-48 rounded-md border border-ink-faint bg-paper-raised px-2 py-1 text-sm"
          value={draft}
          onChange={(event) => setDraft(event.target.value)}
          onKeyDown={(event) => event.key === 'Escape' && stop()}
        />
        <Button type="submit" className="min-h-8 px-3 py-1" pending={rename.isPending} pendingLabel="Saving…">
          Save
        </Button>
        <Button variant="secondary" className="min-h-8 px-3 py-1" onClick={stop} disabled={rename.isPending}>
          Cancel
        </Button>
      </div>
      {problem && (
        <p role="alert" className="text-sm text-danger">
          {problem}
        </p>
      )}
    </form>
  );
}
