// Where a new study runs by default: the browser for small studies, the server above the stated
// threshold of simulated hours, the user's choice always; and server jobs kept short.
import { describe, expect, it } from 'vitest';
import { SERVER_SUGGESTED_ABOVE_HOURS } from '../../../shared/api/studies';
import type { Scenario } from '../../../shared/scenario/scenario';
import stacked from '../../../shared/examples/stacked-loop.json';
import {
  SERVER_JOB_HOURS,
  defaultForm,
  formHours,
  runPlaceOf,
  studyInput,
} from '../../../src/features/studies/utils/study-form';

const scenario = stacked as unknown as Scenario;

describe('where a study runs', () => {
  it('stays in the browser at the threshold and goes to the server just past it', () => {
    // 10 carrier counts × 10 replications × (h + 0.5 h warm-up): solve for exactly the threshold.
    const form = {
      ...defaultForm('carrierSizing', scenario),
      carriersFrom: '10',
      carriersTo: '19',
      carrierPoints: '10',
    };
    const perReplication = SERVER_SUGGESTED_ABOVE_HOURS / 100;
    const at = { ...form, replications: '10', hours: String(perReplication - 0.5) };
    expect(formHours(at, scenario)).toBeCloseTo(SERVER_SUGGESTED_ABOVE_HOURS, 6);
    expect(runPlaceOf(at, formHours(at, scenario))).toBe('browser');
    const past = { ...at, replications: '11' };
    expect(runPlaceOf(past, formHours(past, scenario))).toBe('server');
    expect(runPlaceOf({ ...past, runOn: 'browser' }, formHours(past, scenario))).toBe('browser');
    expect(runPlaceOf({ ...at, runOn: 'server' }, formHours(at, scenario))).toBe('server');
  });

  it('an unreadable number leaves the size unknown and the study in the browser', () => {
    const form = { ...defaultForm('carrierSizing', scenario), hours: 'eight' };
    expect(formHours(form, scenario)).toBeNull();
    expect(runPlaceOf(form, null)).toBe('browser');
  });

  it('server jobs simulate at most about the job length, browser jobs follow the eight-job rule', () => {
    const form = { ...defaultForm('carrierSizing', scenario), hours: '168', warmupMinutes: '0', replications: '30' };
    const onServer = studyInput({ ...form, runOn: 'server' }, scenario, '00000000-0000-4000-8000-000000000000');
    expect(onServer.runOn).toBe('server');
    expect(onServer.blockSize! * 168).toBeLessThanOrEqual(SERVER_JOB_HOURS);
    expect(onServer.blockSize).toBe(1);
    const inBrowser = studyInput({ ...form, runOn: 'browser' }, scenario, '00000000-0000-4000-8000-000000000000');
    expect(inBrowser.blockSize).toBeGreaterThan(1);
  });
});
