// Seeded pseudo-random numbers for simulation tests, so every run draws the same series.
// mulberry32 uniforms (test/support/seededUniforms.ts) through the Box & Muller (1958)
// transform for standard normals.
import { seededUniforms } from '../support/seededUniforms.js';

/** A function returning independent N(0, 1) draws, fixed by `seed`. */
export function seededNormals(seed: number): () => number {
  const uniform = seededUniforms(seed);
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const draw = spare;
      spare = undefined;
      return draw;
    }
    const radius = Math.sqrt(-2 * Math.log(uniform()));
    const angle = 2 * Math.PI * uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
}
