// The question a comparison answers, as put on the page and at the top of the report.
export const COMPARE_QUESTION =
  'Which layout should the line use: which makes more parts per hour, is the difference real or noise, and what does each cost?';

/** The question a comparison of studies answers. */
export const STUDY_COMPARE_QUESTION =
  'Which layout should the line use: at each setting the studies share, which makes more parts per hour, is the difference real or noise, and how many carriers does each need?';
