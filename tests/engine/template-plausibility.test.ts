// Every bundled example is physically plausible: a deck people work at is at a working height and has
// room above it. The figures are common trade practice for standing light assembly work (about elbow
// height, 900 to 1,100 mm) and an allowance of about 700 mm for hands, parts and tools, recalled from
// practice rather than taken from a standard.
import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { exampleFiles, loadExample } from './helpers';

describe('bundled examples', () => {
  for (const file of exampleFiles()) {
    it(`${file}: decks with manual stations are at a working height with room above`, () => {
      const s = scenarioSchema.parse(loadExample(file));
      const laneDeck = new Map(s.lanes.map((l) => [l.id, l.deckId]));
      const manualDecks = new Set(
        s.steps.flatMap((step) =>
          step.stations.filter((st) => st.operation === 'manual').map((st) => laneDeck.get(st.laneId)),
        ),
      );
      for (const deck of s.decks.filter((d) => manualDecks.has(d.id))) {
        expect(deck.elevationMm, deck.id).toBeGreaterThanOrEqual(900);
        expect(deck.elevationMm, deck.id).toBeLessThanOrEqual(1100);
        const above = s.decks
          .filter((d) => d.elevationMm > deck.elevationMm)
          .map((d) => d.elevationMm - deck.elevationMm);
        for (const gap of above) expect(gap, `${deck.id}: room above`).toBeGreaterThanOrEqual(700);
      }
    });
  }
});
