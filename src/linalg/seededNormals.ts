// Seeded standard normal draws, for simulations whose results must be the same on every run:
// mulberry32 uniforms (Tommy Ettinger's 32-bit generator, public domain; from memory) through
// the Box & Muller (1958) transform, both values of each pair used.

/** A function returning independent N(0, 1) draws, the same sequence for the same `seed`. */
export function seededNormals(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    // In (0, 1): never 0, so the logarithm below is finite.
    return (((z ^ (z >>> 14)) >>> 0) + 0.5) / 4294967296;
  };
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
