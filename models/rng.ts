// Small seeded PRNG for reproducible Monte Carlo: same seed -> same stream on
// every JS engine (32-bit integer arithmetic only, no Math.random).

export interface Rng {
  /** Uniform in [0, 1). */
  uniform(): number;
  /** Standard normal N(0, 1). */
  normal(): number;
  /** Standard normal truncated to [-limit, +limit] (rejection; exact shape). */
  truncatedNormal(limit: number): number;
}

/** Spread a user seed over 32 bits (splitmix32-style finaliser) so seeds 1, 2, 3 start far apart. */
function mixSeed(seed: number): number {
  let z = (Math.trunc(seed) ^ 0x9e3779b9) >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
  return (z ^ (z >>> 16)) >>> 0;
}

/**
 * mulberry32 (Tommy Ettinger's public-domain 32-bit generator; period 2^32),
 * plenty for a few thousand samples of a handful of parameters, with
 * Box–Muller (polar-free form) for normals.
 */
export function createRng(seed: number): Rng {
  let state = mixSeed(seed);
  let spare = 0;
  let hasSpare = false;

  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };

  const normal = (): number => {
    if (hasSpare) {
      hasSpare = false;
      return spare;
    }
    // 1 - u keeps the log argument in (0, 1].
    const r = Math.sqrt(-2 * Math.log(1 - uniform()));
    const a = 2 * Math.PI * uniform();
    spare = r * Math.sin(a);
    hasSpare = true;
    return r * Math.cos(a);
  };

  const truncatedNormal = (limit: number): number => {
    if (!(limit > 0)) return 0;
    // Rejection keeps the exact truncated shape; at 3σ only 0.27 % of draws are redrawn.
    for (;;) {
      const z = normal();
      if (z >= -limit && z <= limit) return z;
    }
  };

  return { uniform, normal, truncatedNormal };
}
