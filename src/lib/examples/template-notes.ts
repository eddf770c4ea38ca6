// Short notes on the bundled example layouts, for choosing a starting point.
export const TEMPLATE_NOTES: Record<string, { title: string; summary: string }> = {
  'stacked-loop': {
    title: 'Stacked loop with elevators',
    summary: 'Work on the upper deck, empty carriers return below; an elevator at each end. Smallest footprint.',
  },
  'side-by-side-loop': {
    title: 'Side-by-side loop',
    summary: 'Work and return lanes next to each other on one deck, joined by lateral transfers. Easy access, wider footprint.',
  },
  'multi-lane-split': {
    title: 'Multi-lane split and merge',
    summary: 'The slow manual step is done on two parallel lanes; carriers split before it and merge after.',
  },
  'triple-deck': {
    title: 'Triple deck',
    summary: 'Automatic work on top, manual work in the middle, an empty-carrier store at the bottom; elevators at both ends.',
  },
  'belt-baseline': {
    title: 'Belt baseline',
    summary: 'The stacked loop as a conventional belt conveyor with pallets, to show what independent carriers gain.',
  },
};
