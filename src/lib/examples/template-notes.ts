// Short notes on the bundled example layouts, for choosing a starting point.
//
// The figures in the examples (shared/examples/*.json) are chosen to be physically plausible; where
// they come from, so a reviewer can judge them (common trade practice, recalled, not a standard):
// - Work deck heights of 950 to 1,050 mm: standing assembly work at about elbow height, the usual
//   range for light manual work. Decks that only return or store carriers sit 250 to 450 mm lower or
//   higher, enough for a track module, a carrier and its part.
// - A manual deck with another deck above it keeps about 800 mm clear for hands, parts and tools
//   (the triple deck: manual 950 mm, automatic 1,750 mm, store 500 mm).
// - Carriers of 160 to 200 mm with 40 mm minimum gaps, top speeds of 2 to 2.5 m/s and accelerations
//   of 10 to 20 m/s² (about 1 to 2 g), loaded slower than empty: typical of linear-motor carrier tracks.
// - Elevators lift at about 500 mm/s with 1 to 1.5 s handling per end; a belt runs at about 250 mm/s
//   with a stop-and-locate time of about 1.5 s per station.
// - Station cycle times of 4 to 12 s (presses, screwdrivers, manual fitting) for a takt near 10 s.
export const TEMPLATE_NOTES: Record<string, { title: string; summary: string }> = {
  'stacked-loop': {
    title: 'Stacked loop with elevators',
    summary: 'Work on the upper deck, empty carriers return below; an elevator at each end. Smallest footprint.',
  },
  'side-by-side-loop': {
    title: 'Side-by-side loop',
    summary:
      'Work and return lanes next to each other on one deck, joined by lateral transfers. Easy access, wider footprint.',
  },
  'multi-lane-split': {
    title: 'Multi-lane split and merge',
    summary: 'The slow manual step is done on two parallel lanes; carriers split before it and merge after.',
  },
  'triple-deck': {
    title: 'Triple deck',
    summary:
      'Automatic work on top, manual work in the middle, an empty-carrier store at the bottom; elevators at both ends.',
  },
  'belt-baseline': {
    title: 'Belt baseline',
    summary: 'The stacked loop as a conventional belt conveyor with pallets, to show what independent carriers gain.',
  },
};
