// What the playback's colours and fills mean: station rings by state, carriers with and without a part.
import { STATION_STATES, stateColour, stateLabel } from '../../charts/palette';
import { DRAWING } from '../drawing-frame';

export function PlaybackKey() {
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft" aria-label="Key">
      {STATION_STATES.map((state) => (
        <li key={state} className="flex items-center gap-1">
          <svg width="14" height="14" aria-hidden="true">
            <circle cx="7" cy="7" r="5" fill="none" stroke={stateColour[state]} strokeWidth="3" />
          </svg>
          station {stateLabel[state]}
        </li>
      ))}
      <li className="flex items-center gap-1">
        <svg width="16" height="10" aria-hidden="true">
          <rect x="1" y="1" width="14" height="8" fill={DRAWING.colour.ink} />
        </svg>
        carrier with a part
      </li>
      <li className="flex items-center gap-1">
        <svg width="16" height="10" aria-hidden="true">
          <rect x="1" y="1" width="14" height="8" fill={DRAWING.colour.paper} stroke={DRAWING.colour.ink} />
        </svg>
        empty carrier
      </li>
    </ul>
  );
}
