import { inverseRelationshipMatrix } from './inverse-relationship-matrix';
import { checkPedigree, type Pedigree } from './pedigree';
import { sparseMultiply } from './sparse-multiply';
import { symmetricInverseDiagonal } from './symmetric-inverse-diagonal';

export interface BlupRecord {
  /** animal index in the pedigree */
  animal: number;
  y: number;
  /** level index per fixed factor (e.g. [sex, contemporary group]) */
  fixed: number[];
}

export interface AnimalModelInput {
  pedigree: Pedigree;
  /** inbreeding coefficients (inbreedingCoefficients) */
  F: ArrayLike<number>;
  records: readonly BlupRecord[];
  /** number of levels of each fixed factor; at least one factor (a one-level factor is an overall mean) */
  fixedLevels: number[];
  /** heritability, giving α = (1 − h²)/h²; or give α itself */
  h2?: number;
  /** variance ratio σ²e/σ²a */
  alpha?: number;
  /** stop when ‖b − C·x‖ / ‖b‖ falls below this (default 1e-10) */
  tolerance?: number;
  /** default 5,000 */
  maxIterations?: number;
  /** exact accuracies up to this many equations (default 1,000), none beyond */
  exactAccuracyLimit?: number;
}

export interface AnimalModelSolution {
  /** solutions per fixed factor and level (constrained or empty levels are 0, see warnings) */
  fixed: number[][];
  breedingValues: Float64Array;
  iterations: number;
  converged: boolean;
  relativeResidual: number;
  /** r = √(1 − PEV/((1 + F)σ²a)) per animal from the exact inverse, or null for large systems */
  accuracy: Float64Array | null;
  warnings: string[];
}

/**
 * Animal-model BLUP: y = Xb + Za + e, var(a) = Aσ²a, var(e) = Iσ²e, solved from Henderson's
 * mixed model equations
 *   [X′X  X′Z        ] [b]   [X′y]
 *   [Z′X  Z′Z + A⁻¹α ] [a] = [Z′y],   α = σ²e/σ²a = (1 − h²)/h²
 * (Henderson 1975; Mrode 2014, ch. 3) with A⁻¹ by Henderson's rules with inbreeding
 * (inverseRelationshipMatrix), by conjugate gradients with a Jacobi (diagonal) preconditioner.
 * The coefficient matrix is never formed: C·x is one pass over the records plus one sparse
 * product with A⁻¹.
 *
 * Several fixed factors make X′X singular: the first level with records of every factor after
 * the first is set to 0 (its equation removed), and levels without records are 0, so the fixed
 * solutions are contrasts with those levels; breeding values do not depend on this choice.
 * Remaining dependencies (e.g. disconnected groups) leave a consistent singular system, which
 * the preconditioned gradients still solve for the estimable functions.
 *
 * Accuracy: for systems of at most `exactAccuracyLimit` equations the diagonal of C⁻¹ is
 * computed exactly (symmetricInverseDiagonal); PEV_i = C^ii σ²e, so r² = 1 − α·C^ii/(1 + F_i).
 * Beyond the limit accuracy is null.
 *
 * Cost: O(k·(R·f + n)) time for k iterations over R records with f factors and n animals
 * (typically k in the hundreds), O(R·f + n) memory; the exact accuracy adds O(m³/3).
 *
 * @throws when the pedigree is malformed, a record refers to an unknown animal or level or has
 *   a non-finite y, or neither (or both) of h2 and alpha is given validly
 */
export function animalModelBlup(input: AnimalModelInput): AnimalModelSolution {
  const caller = 'animalModelBlup';
  const { pedigree, F, records, fixedLevels, tolerance = 1e-10, maxIterations = 5000, exactAccuracyLimit = 1000 } = input;
  const n = checkPedigree(pedigree, caller);
  if (F.length !== n) throw new Error(`${caller} requires F of length ${n} (got ${F.length})`);
  const alpha = varianceRatio(input, caller);
  if (fixedLevels.length === 0) throw new Error(`${caller} requires at least one fixed factor (a one-level factor is an overall mean)`);
  const factors = fixedLevels.length;
  const offset: number[] = [];
  let p = 0;
  for (const levels of fixedLevels) {
    if (!Number.isInteger(levels) || levels < 1) throw new Error(`${caller} requires a positive integer number of levels per fixed factor`);
    offset.push(p);
    p += levels;
  }
  const m = p + n;
  const R = records.length;
  if (R === 0) throw new Error(`${caller} requires at least 1 record`);

  const recordAnimal = new Int32Array(R);
  const recordY = new Float64Array(R);
  const recordEquation = new Int32Array(R * factors);
  const levelCount = new Float64Array(p);
  records.forEach((record, r) => {
    const { animal, y, fixed } = record;
    if (!Number.isInteger(animal) || animal < 0 || animal >= n) throw new Error(`${caller} record ${r} refers to animal ${animal}, not in the pedigree`);
    if (!Number.isFinite(y)) throw new Error(`${caller} record ${r} has a non-finite y`);
    if (fixed.length !== factors) throw new Error(`${caller} record ${r} needs ${factors} fixed levels (got ${fixed.length})`);
    recordAnimal[r] = animal;
    recordY[r] = y;
    for (let f = 0; f < factors; f++) {
      const level = fixed[f];
      if (!Number.isInteger(level) || level < 0 || level >= fixedLevels[f]) {
        throw new Error(`${caller} record ${r} has level ${level} of fixed factor ${f}, outside 0..${fixedLevels[f] - 1}`);
      }
      recordEquation[r * factors + f] = offset[f] + level;
      levelCount[offset[f] + level]++;
    }
  });

  const warnings: string[] = [];
  const active = new Uint8Array(m).fill(1);
  for (let f = 0; f < factors; f++) {
    let constrained = f === 0;
    for (let level = 0; level < fixedLevels[f]; level++) {
      const eq = offset[f] + level;
      if (levelCount[eq] === 0) {
        active[eq] = 0;
        warnings.push(`fixed factor ${f} level ${level} has no records; its solution is set to 0`);
      } else if (!constrained) {
        active[eq] = 0; // the reference level of this factor
        constrained = true;
      }
    }
  }
  for (let r = 0; r < R; r++) {
    for (let f = 0; f < factors; f++) if (!active[recordEquation[r * factors + f]]) recordEquation[r * factors + f] = -1;
  }

  const Ainv = inverseRelationshipMatrix(pedigree, F);
  const rhs = new Float64Array(m);
  const diagonal = new Float64Array(m);
  for (let r = 0; r < R; r++) {
    const y = recordY[r];
    for (let f = 0; f < factors; f++) {
      const eq = recordEquation[r * factors + f];
      if (eq >= 0) {
        rhs[eq] += y;
        diagonal[eq] += 1;
      }
    }
    rhs[p + recordAnimal[r]] += y;
    diagonal[p + recordAnimal[r]] += 1;
  }
  for (let a = 0; a < n; a++) {
    for (let k = Ainv.rowStart[a]; k < Ainv.rowStart[a + 1]; k++) if (Ainv.column[k] === a) diagonal[p + a] += alpha * Ainv.value[k];
  }
  const inverseDiagonal = diagonal.map((value) => (value > 0 ? 1 / value : 0));

  const animalPart = new Float64Array(n);
  const multiply = (x: Float64Array, out: Float64Array): void => {
    sparseMultiply(Ainv, x.subarray(p), animalPart);
    out.fill(0, 0, p);
    for (let a = 0; a < n; a++) out[p + a] = alpha * animalPart[a];
    for (let r = 0; r < R; r++) {
      const base = r * factors;
      const eqA = p + recordAnimal[r];
      let fitted = x[eqA];
      for (let f = 0; f < factors; f++) {
        const eq = recordEquation[base + f];
        if (eq >= 0) fitted += x[eq];
      }
      out[eqA] += fitted;
      for (let f = 0; f < factors; f++) {
        const eq = recordEquation[base + f];
        if (eq >= 0) out[eq] += fitted;
      }
    }
  };

  const x = new Float64Array(m);
  const residual = Float64Array.from(rhs);
  const z = new Float64Array(m);
  const direction = new Float64Array(m);
  const product = new Float64Array(m);
  const rhsNorm = Math.sqrt(dot(rhs, rhs));
  let rz = 0;
  for (let i = 0; i < m; i++) {
    z[i] = inverseDiagonal[i] * residual[i];
    direction[i] = z[i];
    rz += residual[i] * z[i];
  }
  let iterations = 0;
  let relativeResidual = rhsNorm === 0 ? 0 : 1;
  while (relativeResidual > tolerance && iterations < maxIterations) {
    multiply(direction, product);
    const step = rz / dot(direction, product);
    let rr = 0;
    for (let i = 0; i < m; i++) {
      x[i] += step * direction[i];
      residual[i] -= step * product[i];
      rr += residual[i] * residual[i];
    }
    iterations++;
    relativeResidual = Math.sqrt(rr) / rhsNorm;
    let rzNext = 0;
    for (let i = 0; i < m; i++) {
      z[i] = inverseDiagonal[i] * residual[i];
      rzNext += residual[i] * z[i];
    }
    const beta = rzNext / rz;
    rz = rzNext;
    for (let i = 0; i < m; i++) direction[i] = z[i] + beta * direction[i];
  }
  if (rhsNorm > 0) {
    // The recursive residual drifts from the true one; report the true one.
    multiply(x, product);
    let rr = 0;
    for (let i = 0; i < m; i++) if (active[i]) rr += (rhs[i] - product[i]) ** 2;
    relativeResidual = Math.sqrt(rr) / rhsNorm;
  }
  // The true residual may sit a little above the recursive one the loop stopped on.
  const converged = relativeResidual <= 10 * tolerance;
  if (!converged) warnings.push(`the solver stopped after ${iterations} iterations at relative residual ${relativeResidual.toExponential(2)}`);

  let accuracy: Float64Array | null = null;
  let activeCount = 0;
  for (let i = 0; i < m; i++) activeCount += active[i];
  if (activeCount <= exactAccuracyLimit) {
    accuracy = exactAccuracy();
    if (accuracy === null) warnings.push('the equations are singular (confounded fixed effects); accuracies are not given');
  }

  return {
    fixed: fixedLevels.map((levels, f) => Array.from(x.subarray(offset[f], offset[f] + levels))),
    breedingValues: x.slice(p),
    iterations,
    converged,
    relativeResidual,
    accuracy,
    warnings,
  };

  function exactAccuracy(): Float64Array | null {
    const denseIndex = new Int32Array(m).fill(-1);
    let size = 0;
    for (let i = 0; i < m; i++) if (active[i]) denseIndex[i] = size++;
    const C = new Float64Array(size * size);
    const equations: number[] = [];
    for (let r = 0; r < R; r++) {
      equations.length = 0;
      for (let f = 0; f < factors; f++) if (recordEquation[r * factors + f] >= 0) equations.push(denseIndex[recordEquation[r * factors + f]]);
      equations.push(denseIndex[p + recordAnimal[r]]);
      for (const a of equations) for (const b of equations) C[a * size + b] += 1;
    }
    for (let a = 0; a < n; a++) {
      const row = denseIndex[p + a];
      for (let k = Ainv.rowStart[a]; k < Ainv.rowStart[a + 1]; k++) C[row * size + denseIndex[p + Ainv.column[k]]] += alpha * Ainv.value[k];
    }
    const inverse = symmetricInverseDiagonal(C, size);
    if (inverse === null) return null;
    const result = new Float64Array(n);
    for (let a = 0; a < n; a++) result[a] = Math.sqrt(Math.max(0, 1 - (alpha * inverse[denseIndex[p + a]]) / (1 + F[a])));
    return result;
  }
}

function varianceRatio(input: AnimalModelInput, caller: string): number {
  const { h2, alpha } = input;
  if ((h2 === undefined) === (alpha === undefined)) throw new Error(`${caller} requires exactly one of h2 and alpha`);
  if (h2 !== undefined) {
    if (!(h2 > 0 && h2 < 1)) throw new Error(`${caller} requires h2 strictly between 0 and 1 (got ${h2})`);
    return (1 - h2) / h2;
  }
  if (!(alpha! > 0 && Number.isFinite(alpha))) throw new Error(`${caller} requires a positive finite alpha (got ${alpha})`);
  return alpha!;
}

function dot(a: Float64Array, b: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * b[i];
  return sum;
}
