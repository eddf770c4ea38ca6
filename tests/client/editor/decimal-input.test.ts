// Numbers typed with either decimal separator mean the same; ambiguous text is refused with a reason.
import { describe, expect, it } from 'vitest';
import { decimalProblem, parseDecimal } from '../../../src/features/scenarios/editor/utils/decimal-input';

describe('typed decimals', () => {
  it('reads a comma and a point alike', () => {
    expect(parseDecimal('9,5')).toBe(9.5);
    expect(parseDecimal('9.5')).toBe(9.5);
    expect(parseDecimal(' 12 ')).toBe(12);
    expect(parseDecimal(',25')).toBe(0.25);
    expect(parseDecimal('-3,5')).toBe(-3.5);
    expect(parseDecimal('1e9')).toBe(1e9);
    expect(parseDecimal('')).toBeUndefined();
  });

  it('never turns "9,5" into 95, and refuses what could be a thousands group', () => {
    expect(parseDecimal('9,5')).not.toBe(95);
    expect(parseDecimal('1,500')).toBe('1,500');
    expect(decimalProblem('1,500')).toMatch(/ambiguous/);
    expect(parseDecimal('1.2.3')).toBe('1.2.3');
    expect(decimalProblem('1.2.3')).toMatch(/not a number/);
    expect(decimalProblem('9,5')).toBeNull();
  });
});
