import { IndexMaxHeap } from './index-max-heap';
import { mendelianSamplingVariance } from './mendelian-sampling-variance';
import { checkPedigree, type Pedigree } from './pedigree';

/**
 * Wright's inbreeding coefficient F of every animal, F_i = a_{sire,dam} / 2, by Colleau's
 * indirect method applied per sire and generation, as in Sargolzaei, Iwaisaki & Colleau (2005)
 * J. Anim. Breed. Genet. 122:325–331 (from memory); Colleau (2002) Genet. Sel. Evol. 34:409.
 *
 * With A = T·D·T′ (T = (I − P)⁻¹, P holding ½ at each known parent; D the Mendelian sampling
 * variances, see mendelianSamplingVariance), the relationships of a sire s with all his mates
 * come from one column A·e_s: a backward pass u = T′e_s over the ancestors of s (u_k is the
 * share of ancestor k in s, as in Meuwissen & Luo 1992), then a forward pass
 * w_x = d_x·u_x + ½(w_sire(x) + w_dam(x)) over the ancestors of the mates only; a_{s,m} = w_m.
 * Animals are processed by generation number (founders 0, else 1 + the older parent's), so
 * every d_k needed is known. Animals with an unknown parent get F = 0.
 *
 * Cost: O(Σ over (sire, generation) groups of (A_s + A_M) log(A_s + A_M)) time, A_s the
 * ancestors of the sire and A_M those of his mates in that generation; O(n) memory. Linear in
 * n for pedigrees of bounded depth (many herds or breeds), whatever their number.
 *
 * @param pedigree parents precede offspring, −1 unknown (see sortPedigree)
 * @returns F per animal
 * @throws when the pedigree is malformed (see checkPedigree)
 */
export function inbreedingCoefficients(pedigree: Pedigree): Float64Array {
  const n = checkPedigree(pedigree, 'inbreedingCoefficients');
  const { sire, dam } = pedigree;
  const F = new Float64Array(n);
  const d = new Float64Array(n);

  // Counting sort of the animals by generation number.
  const generation = new Int32Array(n);
  let maxGeneration = 0;
  for (let i = 0; i < n; i++) {
    const s = sire[i];
    const m = dam[i];
    const g = 1 + Math.max(s >= 0 ? generation[s] : -1, m >= 0 ? generation[m] : -1);
    generation[i] = g;
    if (g > maxGeneration) maxGeneration = g;
  }
  const start = new Int32Array(maxGeneration + 2);
  for (let i = 0; i < n; i++) start[generation[i] + 1]++;
  for (let g = 0; g <= maxGeneration; g++) start[g + 1] += start[g];
  const byGeneration = new Int32Array(n);
  const fill = start.slice(0, maxGeneration + 1);
  for (let i = 0; i < n; i++) byGeneration[fill[generation[i]]++] = i;

  const u = new Float64Array(n); // T′e_s, zero outside the current backward pass
  const v = new Float64Array(n); // D·u
  const w = new Float64Array(n); // T·D·u on the mates' ancestors
  const visited = new Int32Array(n).fill(-1); // group stamp of the forward traversal
  const backward = new Int32Array(n);
  const forward = new Int32Array(n);
  const firstChild = new Int32Array(n).fill(-1); // per sire, a linked list of offspring
  const nextChild = new Int32Array(n);
  const sires: number[] = [];
  const heap = new IndexMaxHeap(1024);
  let stamp = 0;

  for (let g = 0; g <= maxGeneration; g++) {
    const from = start[g];
    const to = start[g + 1];
    sires.length = 0;
    for (let p = from; p < to; p++) {
      const i = byGeneration[p];
      const s = sire[i];
      if (s < 0 || dam[i] < 0) continue;
      if (firstChild[s] === -1) sires.push(s);
      nextChild[i] = firstChild[s];
      firstChild[s] = i;
    }

    for (const s of sires) {
      // Backward pass: u over s and its ancestors, youngest first.
      let nb = 0;
      u[s] = 1;
      heap.push(s);
      while (heap.size > 0) {
        const k = heap.pop();
        backward[nb++] = k;
        const uk = u[k];
        v[k] = uk * d[k];
        const ks = sire[k];
        const km = dam[k];
        if (ks >= 0) {
          if (u[ks] === 0) heap.push(ks);
          u[ks] += 0.5 * uk;
        }
        if (km >= 0) {
          if (u[km] === 0) heap.push(km);
          u[km] += 0.5 * uk;
        }
      }

      // Forward pass over the mates and their ancestors, oldest first.
      stamp++;
      let nf = 0;
      for (let i = firstChild[s]; i !== -1; i = nextChild[i]) {
        const m = dam[i];
        if (visited[m] !== stamp) {
          visited[m] = stamp;
          heap.push(m);
        }
      }
      while (heap.size > 0) {
        const k = heap.pop();
        forward[nf++] = k;
        const ks = sire[k];
        const km = dam[k];
        if (ks >= 0 && visited[ks] !== stamp) {
          visited[ks] = stamp;
          heap.push(ks);
        }
        if (km >= 0 && visited[km] !== stamp) {
          visited[km] = stamp;
          heap.push(km);
        }
      }
      for (let q = nf - 1; q >= 0; q--) {
        const x = forward[q];
        const xs = sire[x];
        const xm = dam[x];
        w[x] = v[x] + 0.5 * ((xs >= 0 ? w[xs] : 0) + (xm >= 0 ? w[xm] : 0));
      }

      for (let i = firstChild[s]; i !== -1; i = nextChild[i]) F[i] = 0.5 * w[dam[i]];

      for (let q = 0; q < nf; q++) w[forward[q]] = 0;
      for (let q = 0; q < nb; q++) {
        const k = backward[q];
        u[k] = 0;
        v[k] = 0;
      }
      firstChild[s] = -1;
    }

    for (let p = from; p < to; p++) {
      const i = byGeneration[p];
      d[i] = mendelianSamplingVariance(sire[i], dam[i], F);
    }
  }
  return F;
}
