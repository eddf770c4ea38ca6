// The create-study form's values and how they become the API's study definition. Kept apart from
// the component so the building rules (defaults, grids, the what-if points) are plain functions.
import {
  SERVER_SUGGESTED_ABOVE_HOURS,
  studySimulatedHours,
  type CreateStudyInput,
  type StudyKind,
  type StudyRunPlace,
} from '../../../../shared/api/studies';
import type { Scenario } from '../../../../shared/scenario/scenario';
import { sweepableFields } from '../../../../shared/studies/sweepable-fields';
import {
  carrierSizingPoints,
  rangeValues,
  sweepPoints,
  whatIfPoints,
  type SweepAxis,
} from '../../../../workers/studies/build-points';
import { carrierGrid, defaultCarrierRange, SIZING_DEFAULTS } from '../../../../workers/studies/carrier-sizing';

export type AxisForm = { path: string; mode: 'range' | 'list'; from: string; to: string; count: string; list: string };

export type StudyForm = {
  name: string;
  kind: StudyKind;
  hours: string;
  warmupMinutes: string;
  replications: string;
  seed: string;
  commonRandomNumbers: boolean;
  carriersFrom: string;
  carriersTo: string;
  carrierPoints: string;
  axes: AxisForm[];
  reductionPercent: string;
  /** `auto` until the user chooses: then the study's size decides. */
  runOn: StudyRunPlace | 'auto';
};

export function emptyAxis(): AxisForm {
  return { path: '', mode: 'range', from: '', to: '', count: '5', list: '' };
}

export function defaultForm(kind: StudyKind, scenario: Scenario | undefined): StudyForm {
  const range = scenario ? defaultCarrierRange(scenario) : { low: 1, high: 1 };
  return {
    name: '',
    kind,
    hours: '8',
    warmupMinutes: '30',
    replications: kind === 'whatIf' ? '10' : '10',
    seed: '1',
    commonRandomNumbers: true,
    carriersFrom: String(range.low),
    carriersTo: String(range.high),
    carrierPoints: String(SIZING_DEFAULTS.gridPoints),
    axes: [emptyAxis()],
    reductionPercent: '10',
    runOn: 'auto',
  };
}

const num = (s: string) => (s.trim() === '' ? Number.NaN : Number(s));

function axisOf(a: AxisForm, scenario: Scenario): SweepAxis | null {
  const field = sweepableFields(scenario).find((f) => f.path === a.path);
  if (!field) return null;
  const values =
    a.mode === 'list'
      ? a.list
          .split(/[\s,;]+/)
          .filter(Boolean)
          .map(Number)
      : rangeValues(num(a.from), num(a.to), num(a.count), field.whole);
  return { path: field.path, label: `${field.group}: ${field.label}`, values };
}

const KIND_NAMES: Record<StudyKind, string> = {
  carrierSizing: 'Carrier sizing',
  sweep: 'Sweep',
  whatIf: 'Speed-up ranking',
};

/** A server job simulates about this many hours at most, so one job stays well inside its time limit. */
export const SERVER_JOB_HOURS = 200;

/**
 * About eight jobs at least, so every worker has work even when a study has few points; on the server,
 * also short jobs, so many workers share a long study and a lost job costs little.
 */
function withBlockSize(input: CreateStudyInput): CreateStudyInput {
  const { replications, hours, warmupMinutes } = input.settings;
  if (typeof replications !== 'number' || !Number.isInteger(replications) || replications < 1) return input;
  const jobsPerPoint = Math.max(1, Math.ceil(8 / Math.max(1, input.points.length)));
  let blockSize = Math.ceil(replications / Math.min(jobsPerPoint, replications));
  const perReplication = (hours ?? 0) + (warmupMinutes ?? 0) / 60;
  if (input.runOn === 'server' && perReplication > 0)
    blockSize = Math.max(1, Math.min(blockSize, Math.floor(SERVER_JOB_HOURS / perReplication)));
  return { ...input, blockSize };
}

/** Simulated hours of the form's study, or null while a number in it is unreadable. */
export function formHours(form: StudyForm, scenario: Scenario): number | null {
  let built: CreateStudyInput;
  try {
    built = definition(form, scenario, '');
  } catch {
    return null;
  }
  const { points, settings } = built;
  const hours = studySimulatedHours({
    points,
    settings: {
      replications: settings.replications ?? 0,
      hours: settings.hours ?? 0,
      warmupMinutes: settings.warmupMinutes ?? 0,
    },
  });
  return Number.isFinite(hours) && hours >= 0 ? hours : null;
}

/** Where the study runs: the user's choice, or else the server once the study is large. */
export function runPlaceOf(form: StudyForm, hours: number | null): StudyRunPlace {
  if (form.runOn !== 'auto') return form.runOn;
  return hours !== null && hours > SERVER_SUGGESTED_ABOVE_HOURS ? 'server' : 'browser';
}

/** The request for the form's values; numbers the user left unreadable go to the server as they are, to be named there. */
export function studyInput(form: StudyForm, scenario: Scenario, revisionId: string): CreateStudyInput {
  const input = definition(form, scenario, revisionId);
  return withBlockSize({ ...input, runOn: runPlaceOf(form, formHours(form, scenario)) });
}

function definition(form: StudyForm, scenario: Scenario, revisionId: string): CreateStudyInput {
  const settings = {
    hours: num(form.hours),
    warmupMinutes: num(form.warmupMinutes),
    replications: num(form.replications),
    seed: /^\d+$/.test(form.seed.trim()) ? Number(form.seed) : form.seed,
  };
  const base = {
    name: form.name.trim() || `${KIND_NAMES[form.kind]} of ${scenario.name}`,
    kind: form.kind,
    revisionId,
    settings,
    commonRandomNumbers: form.commonRandomNumbers,
  };
  if (form.kind === 'carrierSizing') {
    return {
      ...base,
      axes: [{ path: 'carriers.count', label: 'Carriers' }],
      points: carrierSizingPoints(carrierGrid(num(form.carriersFrom), num(form.carriersTo), num(form.carrierPoints))),
    };
  }
  if (form.kind === 'whatIf') {
    const reduction = num(form.reductionPercent) / 100;
    return { ...base, reduction, points: whatIfPoints(scenario, reduction) };
  }
  const axes = form.axes.map((a) => axisOf(a, scenario)).filter((a): a is SweepAxis => a !== null);
  return { ...base, axes: axes.map(({ path, label }) => ({ path, label })), points: sweepPoints(axes) };
}
