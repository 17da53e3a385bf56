/**
 * Airy functions Ai, Bi and their derivatives for the closed-form leg tests
 * (a Seebeck coefficient linear in temperature, see
 * seebeck-linear-in-temperature.test.ts). Nothing in the engine uses them.
 *
 * Maclaurin series, M. Abramowitz and I. A. Stegun, Handbook of Mathematical
 * Functions (NBS 1964), 10.4.2–10.4.5:
 *   Ai(z) = c₁f(z) − c₂g(z),  Bi(z) = √3·(c₁f(z) + c₂g(z)),
 *   f(z) = 1 + z³/3! + 1·4·z⁶/6! + 1·4·7·z⁹/9! + …,
 *   g(z) = z + 2·z⁴/4! + 2·5·z⁷/7! + …,
 *   c₁ = Ai(0) = 0.355028053887817239…,  c₂ = −Ai′(0) = 0.258819403792806798….
 * The series converge for every z, but for large positive z Ai is the small
 * difference of two large terms; below |z| = 3 at most ~3 digits cancel
 * (Ai(3) ≈ 6.6e-3 against f(3) ≈ 1e1), so the functions are good to ~1e-13
 * there, which is all the tests need. Checked against A&S Table 10.11 and the
 * Wronskian in the test that uses them.
 */

const C1 = 0.3550280538878172; // 0.355028053887817239… to double precision
const C2 = 0.2588194037928068; // 0.258819403792806798…
const SQRT3 = Math.sqrt(3);
/** Beyond this the cancellation above grows past what the tests tolerate. */
export const AIRY_MAX_ARGUMENT = 3;

export type Airy = { ai: number; aiPrime: number; bi: number; biPrime: number };

/** Sum of a series whose terms follow term_{k+1} = term_k·ratio(k), from term₀, until terms stop mattering. */
function series(first: number, ratio: (k: number) => number): number {
  let term = first;
  let sum = first;
  for (let k = 0; k < 200; k++) {
    term *= ratio(k);
    sum += term;
    if (Math.abs(term) <= 1e-18 * Math.abs(sum)) break;
  }
  return sum;
}

export function airy(z: number): Airy {
  if (!(Math.abs(z) <= AIRY_MAX_ARGUMENT)) throw new Error(`airy: |z| = ${Math.abs(z)} beyond the series' accurate range (${AIRY_MAX_ARGUMENT})`);
  const z3 = z * z * z;
  // Term ratios of f, g, f′, g′ (k counts terms from the first one shown).
  const f = series(1, (k) => z3 / ((3 * k + 2) * (3 * k + 3)));
  const g = series(z, (k) => z3 / ((3 * k + 3) * (3 * k + 4)));
  // f′ = z²/2! + 1·4·z⁵/5! + …: term_{k+1}/term_k = z³/((3k+3)(3k+5)).
  const fPrime = series((z * z) / 2, (k) => z3 / ((3 * k + 3) * (3 * k + 5)));
  // g′ = 1 + 2·z³/3! + 2·5·z⁶/6! + …: term_{k+1}/term_k = z³/((3k+1)(3k+3)).
  const gPrime = series(1, (k) => z3 / ((3 * k + 1) * (3 * k + 3)));
  return {
    ai: C1 * f - C2 * g,
    aiPrime: C1 * fPrime - C2 * gPrime,
    bi: SQRT3 * (C1 * f + C2 * g),
    biPrime: SQRT3 * (C1 * fPrime + C2 * gPrime),
  };
}
