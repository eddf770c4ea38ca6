import { describe, expect, it } from 'vitest';
import { safeReturnTo, signInPath } from '../../src/features/auth/utils/return-to';

describe('return address after sign-in', () => {
  it('keeps a path inside Lanewright, with its query', () => {
    expect(safeReturnTo(`?${new URLSearchParams({ returnTo: '/scenarios/abc?tab=runs' })}`)).toBe(
      '/scenarios/abc?tab=runs',
    );
  });

  it.each(['//elsewhere.example/steal', 'https://elsewhere.example/', '/\\elsewhere.example', 'scenarios/abc', ''])(
    'refuses %j and goes to the project list',
    (value) => {
      expect(safeReturnTo(`?${new URLSearchParams({ returnTo: value })}`)).toBe('/');
    },
  );

  it('adds no return address for the project list or the sign-in pages themselves', () => {
    expect(signInPath('/')).toBe('/sign-in');
    expect(signInPath('/sign-up?x=1')).toBe('/sign-in');
    expect(signInPath('/projects/p1')).toBe('/sign-in?returnTo=%2Fprojects%2Fp1');
  });
});
