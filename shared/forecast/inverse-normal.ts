/**
 * The standard normal distribution: its CDF and the exact inverse used to turn a chapter's service
 * level into the z of the safety stock. Textbooks read z from a table rounded to two places
 * (95 % → 1.65); the product uses the exact value (1.6449) and tests allow for the rounding.
 */

/** Horner's rule, coefficients from the constant term up. */
function polynomial(x: number, coefficients: readonly number[]): number {
  let value = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) value = value * x + coefficients[i]!;
  return value;
}

// Wichura, "Algorithm AS 241: The percentage points of the normal distribution",
// Applied Statistics 37 (1988) 477–484, PPND16: relative accuracy about 1e-16.
const SPLIT1 = 0.425;
const SPLIT2 = 5;
const CONST1 = 0.180625;
const CONST2 = 1.6;
const A = [
  3.3871328727963666080, 1.3314166789178437745e+2, 1.9715909503065514427e+3, 1.3731693765509461125e+4,
  4.5921953931549871457e+4, 6.7265770927008700853e+4, 3.3430575583588128105e+4, 2.5090809287301226727e+3,
];
const B = [
  1, 4.2313330701600911252e+1, 6.8718700749205790830e+2, 5.3941960214247511077e+3,
  2.1213794301586595867e+4, 3.9307895800092710610e+4, 2.8729085735721942674e+4, 5.2264952788528545610e+3,
];
const C = [
  1.42343711074968357734, 4.63033784615654529590, 5.76949722146069140550, 3.64784832476320460504,
  1.27045825245236838258, 2.41780725177450611770e-1, 2.27238449892691845833e-2, 7.74545014278341407640e-4,
];
const D = [
  1, 2.05319162663775882187, 1.67638483018380384940, 6.89767334985100004550e-1,
  1.48103976427480074590e-1, 1.51986665636164571966e-2, 5.47593808499534494600e-4, 1.05075007164441684324e-9,
];
const E = [
  6.65790464350110377720, 5.46378491116411436990, 1.78482653991729133580, 2.96560571828504891230e-1,
  2.65321895265761230930e-2, 1.24266094738807843860e-3, 2.71155556874348757815e-5, 2.01033439929228813265e-7,
];
const F = [
  1, 5.99832206555887937690e-1, 1.36929880922735805310e-1, 1.48753612908506148525e-2,
  7.86869131145613259100e-4, 1.84631831751005468180e-5, 1.42151175831644588870e-7, 2.04426310338993978564e-15,
];

/** z such that P(Z ≤ z) = p for the standard normal Z; p strictly between 0 and 1. */
export function inverseNormal(p: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`inverseNormal needs 0 < p < 1, got ${p}`);
  const q = p - 0.5;
  if (Math.abs(q) <= SPLIT1) {
    const r = CONST1 - q * q;
    return (q * polynomial(r, A)) / polynomial(r, B);
  }
  let r = Math.sqrt(-Math.log(q < 0 ? p : 1 - p));
  let value: number;
  if (r <= SPLIT2) {
    r -= CONST2;
    value = polynomial(r, C) / polynomial(r, D);
  } else {
    r -= SPLIT2;
    value = polynomial(r, E) / polynomial(r, F);
  }
  return q < 0 ? -value : value;
}

// Cody, "Rational Chebyshev approximations for the error function", Mathematics of Computation 23
// (1969) 631–638, as in his SPECFUN routine CALERF: erfc to about 1e-16 relative.
const ERF_A = [
  3.16112374387056560e00, 1.13864154151050156e02, 3.77485237685302021e02, 3.20937758913846947e03,
  1.85777706184603153e-1,
];
const ERF_B = [
  2.36012909523441209e01, 2.44024637934444173e02, 1.28261652607737228e03, 2.84423683343917062e03,
];
const ERFC_C = [
  5.64188496988670089e-1, 8.88314979438837594e0, 6.61191906371416295e01, 2.98635138197400131e02,
  8.81952221241769090e02, 1.71204761263407058e03, 2.05107837782607147e03, 1.23033935479799725e03,
  2.15311535474403846e-8,
];
const ERFC_D = [
  1.57449261107098347e01, 1.17693950891312499e02, 5.37181101862009858e02, 1.62138957456669019e03,
  3.29079923573345963e03, 4.36261909014324716e03, 3.43936767414372164e03, 1.23033935480374942e03,
];
const ERFC_P = [
  3.05326634961232344e-1, 3.60344899949804439e-1, 1.25781726111229246e-1, 1.60837851487422766e-2,
  6.58749161529837803e-4, 1.63153871373020978e-2,
];
const ERFC_Q = [
  2.56852019228982242e00, 1.87295284992346047e00, 5.27905102951428412e-1, 6.05183413124413191e-2,
  2.33520497626869185e-3,
];
const ONE_OVER_SQRT_PI = 5.6418958354775628695e-1;
/** Beyond this erfc underflows to 0 in double precision. */
const ERFC_XBIG = 26.543;

/** exp(−y²) without losing the low bits of y² (Cody's split of y into a 1/16 grid plus a remainder). */
function expMinusSquare(y: number): number {
  const grid = Math.trunc(y * 16) / 16;
  const remainder = (y - grid) * (y + grid);
  return Math.exp(-grid * grid) * Math.exp(-remainder);
}

/** The complementary error function erfc(x) = 1 − erf(x). */
export function erfc(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  const y = Math.abs(x);
  let result: number;
  if (y <= 0.46875) {
    const ysq = y * y;
    let num = ERF_A[4]! * ysq;
    let den = ysq;
    for (let i = 0; i < 3; i++) {
      num = (num + ERF_A[i]!) * ysq;
      den = (den + ERF_B[i]!) * ysq;
    }
    return 1 - (x * (num + ERF_A[3]!)) / (den + ERF_B[3]!);
  } else if (y <= 4) {
    let num = ERFC_C[8]! * y;
    let den = y;
    for (let i = 0; i < 7; i++) {
      num = (num + ERFC_C[i]!) * y;
      den = (den + ERFC_D[i]!) * y;
    }
    result = (expMinusSquare(y) * (num + ERFC_C[7]!)) / (den + ERFC_D[7]!);
  } else if (y >= ERFC_XBIG) {
    result = 0;
  } else {
    const ysq = 1 / (y * y);
    let num = ERFC_P[5]! * ysq;
    let den = ysq;
    for (let i = 0; i < 4; i++) {
      num = (num + ERFC_P[i]!) * ysq;
      den = (den + ERFC_Q[i]!) * ysq;
    }
    const tail = (ysq * (num + ERFC_P[4]!)) / (den + ERFC_Q[4]!);
    result = (expMinusSquare(y) / y) * (ONE_OVER_SQRT_PI - tail);
  }
  return x < 0 ? 2 - result : result;
}

/** P(Z ≤ x) for the standard normal Z: Φ(x) = erfc(−x/√2) / 2. */
export function normalCdf(x: number): number {
  return erfc(-x / Math.SQRT2) / 2;
}
