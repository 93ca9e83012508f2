import { Matrix, QrDecomposition, inverse } from "ml-matrix";

/**
 * Ordinary least squares, y = a + b·x (or y = b·x through the origin) and low-degree polynomials.
 * Plain JSON out: no class instances, no NaN (undefined statistics are `null`).
 *
 * Reference: any regression text, e.g. Montgomery & Runger, Applied Statistics and Probability for
 * Engineers, ch. 11 (simple linear regression, standard errors of the coefficients).
 */

/** Result of {@link fitLine}. Units of `intercept` and `standardError` are those of y. */
export interface LinearFit {
  intercept: number;
  slope: number;
  /**
   * Coefficient of determination 1 − SSE/SST with SST about the mean of y, also when the line is
   * forced through the origin (the uncentred form flatters a forced fit). It can be negative for a
   * forced fit that is worse than a horizontal line; 1 when every point lies on the line.
   */
  rSquared: number;
  /** Standard error of the estimate √(SSE/(n − p)); `null` when n equals the number of parameters p. */
  standardError: number | null;
  /** Standard errors of the coefficients; `null` as above (the intercept's also when forced to 0). */
  interceptStandardError: number | null;
  slopeStandardError: number | null;
  n: number;
  throughOrigin: boolean;
}

/** Result of {@link fitPolynomial}: y = Σ coefficients[i]·x^i. */
export interface PolynomialFit {
  coefficients: number[];
  degree: number;
  rSquared: number;
  standardError: number | null;
  n: number;
}

function checkData(xs: readonly number[], ys: readonly number[], minPoints: number): void {
  if (xs.length !== ys.length) throw new Error(`x and y must have the same length (${xs.length} vs ${ys.length})`);
  if (xs.length < minPoints) throw new Error(`at least ${minPoints} points are needed, got ${xs.length}`);
  xs.forEach((x, i) => {
    if (!Number.isFinite(x) || !Number.isFinite(ys[i]))
      throw new Error(`point ${i + 1}: x and y must be finite numbers`);
  });
}

function rSquaredOf(ys: readonly number[], fitted: readonly number[]): { sse: number; rSquared: number } {
  const mean = ys.reduce((s, y) => s + y, 0) / ys.length;
  let sse = 0;
  let sst = 0;
  ys.forEach((y, i) => {
    sse += (y - fitted[i]) ** 2;
    sst += (y - mean) ** 2;
  });
  // Relative to the data's own size, so exact data does not lose R² = 1 to rounding.
  const scale = ys.reduce((s, y) => s + y * y, 0) || 1;
  if (sst <= 1e-24 * scale) return { sse, rSquared: sse <= 1e-20 * scale ? 1 : 0 };
  return { sse, rSquared: Math.max(-1e9, 1 - sse / sst) };
}

/** Solves the least-squares problem for design matrix rows; returns coefficients and (XᵀX)⁻¹ diagonal. */
function solveLeastSquares(
  rows: number[][],
  ys: readonly number[],
  xs: readonly number[],
  throughOrigin = false,
): { beta: number[]; covDiag: number[] } {
  // Rank is decided on the data, not by a numerical tolerance: p parameters need p distinct x (a forced line, one x ≠
  // 0).
  const distinct = new Set(xs.filter((x) => !throughOrigin || x !== 0)).size;
  if (distinct < rows[0].length) throw new Error("the points do not determine the fit (x values too few or all equal)");
  const X = new Matrix(rows);
  const qr = new QrDecomposition(X);
  if (!qr.isFullRank()) throw new Error("the points do not determine the fit (x values too few or all equal)");
  const beta = qr.solve(Matrix.columnVector([...ys])).to1DArray();
  const xtxInv = inverse(X.transpose().mmul(X));
  return { beta, covDiag: beta.map((_, i) => xtxInv.get(i, i)) };
}

/**
 * Fits y = a + b·x by least squares, or y = b·x when `throughOrigin` is set (then a = 0).
 * @param xs abscissae (any unit)
 * @param ys ordinates (any unit)
 * @throws Error when fewer than 2 points (1 through the origin) or when x cannot fix the slope.
 */
export function fitLine(
  xs: readonly number[],
  ys: readonly number[],
  options: { throughOrigin?: boolean } = {},
): LinearFit {
  const throughOrigin = options.throughOrigin === true;
  const p = throughOrigin ? 1 : 2;
  checkData(xs, ys, p);
  const rows = xs.map((x) => (throughOrigin ? [x] : [1, x]));
  const { beta, covDiag } = solveLeastSquares(rows, ys, xs, throughOrigin);
  const intercept = throughOrigin ? 0 : beta[0];
  const slope = throughOrigin ? beta[0] : beta[1];
  const fitted = xs.map((x) => intercept + slope * x);
  const { sse, rSquared } = rSquaredOf(ys, fitted);
  const dof = xs.length - p;
  const standardError = dof > 0 ? Math.sqrt(sse / dof) : null;
  const se = (i: number) => (standardError === null ? null : standardError * Math.sqrt(covDiag[i]));
  return {
    intercept,
    slope,
    rSquared,
    standardError,
    interceptStandardError: throughOrigin ? null : se(0),
    slopeStandardError: se(throughOrigin ? 0 : 1),
    n: xs.length,
    throughOrigin,
  };
}

/**
 * Fits y = c0 + c1·x + … + c_d·x^d by least squares (d = 1…3). x is centred internally for
 * conditioning; the coefficients returned are for the raw x.
 */
export function fitPolynomial(xs: readonly number[], ys: readonly number[], degree: number): PolynomialFit {
  if (!Number.isInteger(degree) || degree < 1 || degree > 3) throw new Error("degree must be 1, 2 or 3");
  checkData(xs, ys, degree + 1);
  const shift = xs.reduce((s, x) => s + x, 0) / xs.length;
  const rows = xs.map((x) => Array.from({ length: degree + 1 }, (_, k) => (x - shift) ** k));
  const { beta } = solveLeastSquares(rows, ys, xs);
  const coefficients = expandShifted(beta, shift);
  const fitted = xs.map((x) => evaluatePolynomial(coefficients, x));
  const { sse, rSquared } = rSquaredOf(ys, fitted);
  const dof = xs.length - (degree + 1);
  return { coefficients, degree, rSquared, standardError: dof > 0 ? Math.sqrt(sse / dof) : null, n: xs.length };
}

/** Σ β_k (x − s)^k rewritten as Σ c_j x^j (binomial expansion). */
function expandShifted(beta: readonly number[], shift: number): number[] {
  const c = new Array<number>(beta.length).fill(0);
  beta.forEach((b, k) => {
    let binom = 1;
    for (let j = 0; j <= k; j++) {
      c[j] += b * binom * (-shift) ** (k - j);
      binom = (binom * (k - j)) / (j + 1);
    }
  });
  return c;
}

/** Value of Σ c_i·x^i (Horner). */
export function evaluatePolynomial(coefficients: readonly number[], x: number): number {
  let y = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) y = y * x + coefficients[i];
  return y;
}
