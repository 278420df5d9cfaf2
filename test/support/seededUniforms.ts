// Seeded uniform draws on (0, 1), so a test that needs randomness draws the same numbers on
// every run: mulberry32 (Tommy Ettinger's 32-bit generator, from memory).

/** A function returning independent U(0, 1) draws, fixed by `seed`. */
export function seededUniforms(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    return (((z ^ (z >>> 14)) >>> 0) + 0.5) / 4294967296;
  };
}
