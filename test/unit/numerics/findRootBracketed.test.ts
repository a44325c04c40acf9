import { describe, expect, it } from 'vitest';
import { findRootBracketed, RootNotBracketedError } from '@/engine/numerics/findRootBracketed';

describe('findRootBracketed (Brent 1973)', () => {
  it('finds sqrt(2), the Dottie number and a root of a steep function to machine precision', () => {
    const MACHINE_TOLERANCE = 4e-16;
    const cases: { name: string; f: (x: number) => number; a: number; b: number; expected: number }[] = [
      { name: 'x^2 - 2', f: (x) => x * x - 2, a: 0, b: 2, expected: Math.SQRT2 },
      // Fixed point of cos, 0.7390851332151607 (Dottie number; Kaplan, Mathematics Magazine 80 (2007) 73-74, from memory).
      { name: 'cos x - x', f: (x) => Math.cos(x) - x, a: 0, b: 1, expected: 0.7390851332151607 },
      { name: '(x - 1/3)^3 * 1e6', f: (x) => 1e6 * (x - 1 / 3) ** 3, a: -5, b: 3, expected: 1 / 3 },
    ];
    for (const { name, f, a, b, expected } of cases) {
      const got = findRootBracketed(f, a, b);
      // A triple root is only found to about eps^(1/3) in x.
      const tol = name.includes('^3') ? 1e-5 : MACHINE_TOLERANCE * Math.max(1, Math.abs(expected));
      expect(Math.abs(got - expected), `${name} on [${a}, ${b}]: got ${got}, expected ${expected}, tol ${tol}`).toBeLessThan(tol);
    }
  });

  it('needs few evaluations on a smooth root (inverse quadratic steps), unlike bisection', () => {
    let calls = 0;
    findRootBracketed((x) => { calls++; return Math.exp(x) - 3; }, 0, 5);
    // Bisection would need ~55 halvings of [0, 5] to reach 1e-16; Brent takes about ten.
    expect(calls, `evaluations: ${calls}`).toBeLessThan(15);
  });

  it('rejects a bracket without a sign change', () => {
    expect(() => findRootBracketed((x) => x * x + 1, -1, 1)).toThrow(RootNotBracketedError);
  });
});
