// Marks where the scenario editor will sit. Until it exists, the page says
// plainly that the layout is read-only here and how changes are made.
import { Badge } from '../../../components/ui/badge';

export function EditorSlot({ mayEdit }: { mayEdit: boolean }) {
  return (
    <section
      aria-labelledby="editor-slot-title"
      className="flex flex-col gap-2 rounded-lg border-2 border-dashed border-accent/40 bg-accent-soft/30 p-5 sm:flex-row sm:items-center sm:justify-between"
    >
      <div className="flex flex-col gap-1">
        <h2 id="editor-slot-title" className="flex items-center gap-2 font-semibold text-ink">
          Layout editor <Badge tone="caution">Not yet available</Badge>
        </h2>
        <p className="max-w-prose text-sm text-ink-soft">
          {mayEdit
            ? 'Editing lanes, stations, carriers and transfers will happen here, each save making a new revision. For now this layout is read-only.'
            : 'You can read this layout. Engineers and owners will edit it here.'}
        </p>
      </div>
    </section>
  );
}
