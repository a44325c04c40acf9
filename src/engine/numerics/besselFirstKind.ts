// Bessel functions of the first kind, orders 0 and 1, for real x.
// Method: |x| < 2 power series (Abramowitz & Stegun, Handbook of Mathematical Functions, Eq. 9.1.10, from memory);
// 2 <= |x| < 25 Neumann's addition theorem J_n(z0 + d) = sum_k J_k(z0) J_{n-k}(d) (A&S Eq. 9.1.75, from memory) from a
// table of J_0..J_8 at z0 = i/32, built once by Miller's backward recurrence (A&S Eq. 9.1.27) normalised by
// 1 = J0 + 2 sum J_2k (A&S Eq. 9.1.46) (Press et al., Numerical Recipes, 3rd ed., Sec. 6.5; Gautschi, SIAM Review 9
// (1967) 24-82, from memory); |d| <= 1/64, so J_k(d) < 4e-19 beyond k = 7;
// |x| >= 25 Hankel's asymptotic expansion (A&S Eqs. 9.2.5, 9.2.9, 9.2.10, from memory), summed to its smallest term.
// Validity: all real x. Truncation: series and expansions stop when a term falls below 1e-17 of the sum.
// Expected error: below 1e-15 absolute for |x| < 25; beyond, below 1e-15 relative to the envelope sqrt(2/(pi x))
// plus the unavoidable conditioning |x J'| * 1.1e-16 from rounding x itself. Near zeros only absolute error is meaningful.

const SERIES_LIMIT_X = 2;
const ASYMPTOTIC_FROM_X = 25;
const TERM_FLOOR_RELATIVE = 1e-17;
const RESCALE_ABOVE = 1e250;
const TABLE_STEP = 1 / 32;
const TABLE_ORDERS = 9; // J_0 .. J_8 at each node
const ADDITION_TERMS = 7; // k = 1 .. 7 in the addition theorem
const INV_SQRT2 = Math.SQRT1_2;

function powerSeries(order: 0 | 1, x: number): number {
  // J_nu(x) = (x/2)^nu sum_k (-x^2/4)^k / (k! (k+nu)!)  (A&S 9.1.10, from memory)
  const q = -0.25 * x * x;
  let term = order === 0 ? 1 : 0.5 * x;
  let sum = term;
  for (let k = 1; k < 40; k++) {
    term *= q / (k * (k + order));
    sum += term;
    if (Math.abs(term) < TERM_FLOOR_RELATIVE * Math.abs(sum)) break;
  }
  return sum;
}

/** J_0 .. J_{TABLE_ORDERS-1} at x (x >= 1) by Miller's backward recurrence, written into out. */
function millerOrders(x: number, out: Float64Array, offset: number): void {
  // Start far enough above x that J_start(x) is negligible; even start index for the normalisation sum.
  const start = 2 * Math.ceil((x + 8 * Math.cbrt(x) + 20) / 2);
  let above = 0;
  let current = 1e-30;
  let norm = 0;
  const kept = new Float64Array(TABLE_ORDERS);
  for (let k = start; k >= 1; k--) {
    // J_{k-1} = (2k/x) J_k - J_{k+1}  (A&S 9.1.27)
    const below = ((2 * k) / x) * current - above;
    above = current;
    current = below;
    const index = k - 1;
    if (index < TABLE_ORDERS) kept[index] = current;
    if (index > 0 && index % 2 === 0) norm += 2 * current;
    if (Math.abs(current) > RESCALE_ABOVE) {
      above /= RESCALE_ABOVE;
      current /= RESCALE_ABOVE;
      norm /= RESCALE_ABOVE;
      for (let m = index; m < TABLE_ORDERS; m++) kept[m] /= RESCALE_ABOVE;
    }
  }
  norm += kept[0];
  for (let m = 0; m < TABLE_ORDERS; m++) out[offset + m] = kept[m] / norm;
}

let table: Float64Array | null = null;
const TABLE_FIRST = Math.floor(SERIES_LIMIT_X / TABLE_STEP);
const TABLE_LAST = Math.ceil(ASYMPTOTIC_FROM_X / TABLE_STEP);

function tableOf(): Float64Array {
  if (table) return table;
  const t = new Float64Array((TABLE_LAST - TABLE_FIRST + 1) * TABLE_ORDERS);
  for (let i = TABLE_FIRST; i <= TABLE_LAST; i++) millerOrders(i * TABLE_STEP, t, (i - TABLE_FIRST) * TABLE_ORDERS);
  table = t;
  return t;
}

const smallJ = new Float64Array(ADDITION_TERMS + 1);

function additionTheorem(order: 0 | 1, x: number): number {
  const t = tableOf();
  const i = Math.round(x / TABLE_STEP);
  const base = (i - TABLE_FIRST) * TABLE_ORDERS;
  const d = x - i * TABLE_STEP;
  // J_k(d), k = 0..7, by the power series (A&S 9.1.10): |d| <= 1/64, four terms reach 1e-18.
  const q = -0.25 * d * d;
  let lead = 1;
  for (let k = 0; k <= ADDITION_TERMS; k++) {
    if (k > 0) lead *= (0.5 * d) / k;
    smallJ[k] = lead * (1 + (q / (k + 1)) * (1 + (q / (2 * (k + 2))) * (1 + q / (3 * (k + 3)))));
  }
  // J_n(z0 + d) = sum_k J_k(z0) J_{n-k}(d), J_{-m} = (-1)^m J_m (A&S 9.1.5):
  //   J0 = J0(z0) J0(d) + sum_{k>=1} 2 (-1)^k J_k(z0) J_k(d)
  //   J1 = J1(z0) J0(d) + sum_{k>=1} (-1)^(k-1) (J_{k-1}(z0) - J_{k+1}(z0)) J_k(d)
  let sum = t[base + order] * smallJ[0];
  for (let k = 1; k <= ADDITION_TERMS; k++) {
    const sign = k % 2 === 0 ? 1 : -1;
    sum += order === 0 ? 2 * sign * t[base + k] * smallJ[k] : -sign * (t[base + k - 1] - t[base + k + 1]) * smallJ[k];
  }
  return sum;
}

function hankelAsymptotic(order: 0 | 1, x: number): number {
  // J_nu(x) = sqrt(2/(pi x)) (P cos chi - Q sin chi), chi = x - (nu/2 + 1/4) pi,
  // P - i Q summed from a_k = prod_{j=1..k} (mu - (2j-1)^2) / (k! (8x)^k), mu = 4 nu^2  (A&S 9.2.5, 9.2.9, 9.2.10)
  const mu = 4 * order * order;
  const eightX = 8 * x;
  let p = 1;
  let q = 0;
  let term = 1;
  let previous = Infinity;
  for (let k = 1; k < 60; k++) {
    term *= (mu - (2 * k - 1) ** 2) / (k * eightX);
    const size = Math.abs(term);
    if (size > previous) break; // the expansion has passed its smallest term
    // k = 1: +Q, k = 2: -P, k = 3: -Q, k = 4: +P, ...
    switch (k % 4) {
      case 1: q += term; break;
      case 2: p -= term; break;
      case 3: q -= term; break;
      case 0: p += term; break;
    }
    if (size < TERM_FLOOR_RELATIVE) break;
    previous = size;
  }
  const c = Math.cos(x);
  const s = Math.sin(x);
  // cos and sin of chi without subtracting a rounded multiple of pi from x.
  const cosChi = order === 0 ? (c + s) * INV_SQRT2 : (s - c) * INV_SQRT2;
  const sinChi = order === 0 ? (s - c) * INV_SQRT2 : -(s + c) * INV_SQRT2;
  return Math.sqrt(2 / (Math.PI * x)) * (p * cosChi - q * sinChi);
}

/** J0(x) or J1(x) for any real x. J0 is even, J1 odd (A&S 9.1.5). */
export function besselFirstKind(order: 0 | 1, x: number): number {
  const ax = Math.abs(x);
  let value: number;
  if (ax < SERIES_LIMIT_X) value = powerSeries(order, ax);
  else if (ax < ASYMPTOTIC_FROM_X) value = additionTheorem(order, ax);
  else value = hankelAsymptotic(order, ax);
  return order === 1 && x < 0 ? -value : value;
}
