import { describe, expect, it } from 'vitest';
import { parentProblem } from './parent-problem';

describe('parentProblem', () => {
  it('a sire must be a buck, a dam a doe', () => {
    expect(parentProblem('sire', { earId: 'D1', sex: 'doe', birthDate: null }, null)).toBe('D1 is a doe; a sire must be a buck');
    expect(parentProblem('dam', { earId: 'B1', sex: 'buck', birthDate: null }, null)).toBe('B1 is a buck; a dam must be a doe');
    expect(parentProblem('dam', { earId: 'D1', sex: 'doe', birthDate: null }, '2026-01-01')).toBeNull();
  });
  it('a parent must be born before the child; the same day is refused; unknown dates pass', () => {
    const sire = { earId: 'B1', sex: 'buck' as const, birthDate: '2025-06-01' };
    expect(parentProblem('sire', sire, '2026-01-01')).toBeNull();
    expect(parentProblem('sire', sire, '2025-06-01')).toMatch(/not before 2025-06-01/);
    expect(parentProblem('sire', sire, '2025-01-01')).toMatch(/a sire must be born first/);
    expect(parentProblem('sire', { ...sire, birthDate: null }, '2025-01-01')).toBeNull();
  });
});
