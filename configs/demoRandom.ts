// The demo data's own seeded random numbers. Kept beside the demo script, and deliberately not
// shared with the test helpers, so the committed demo files depend on nothing that may change:
// mulberry32 (Tommy Ettinger's 32-bit generator, from memory) for uniforms on (0, 1), and the
// Box & Muller (1958) transform, both of its outputs used, for standard normals.

export interface DemoRandom {
  /** One N(0, 1) draw. */
  normal(): number;
}

export function demoRandom(seed: number): DemoRandom {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let bits = Math.imul(state ^ (state >>> 15), state | 1);
    bits ^= bits + Math.imul(bits ^ (bits >>> 7), bits | 61);
    // Offset by half a step so the draw is never 0 and the logarithm below stays finite.
    return (((bits ^ (bits >>> 14)) >>> 0) + 0.5) / 2 ** 32;
  };
  const pending: number[] = [];
  return {
    normal(): number {
      const saved = pending.pop();
      if (saved !== undefined) return saved;
      const radius = Math.sqrt(-2 * Math.log(uniform()));
      const angle = 2 * Math.PI * uniform();
      pending.push(radius * Math.sin(angle));
      return radius * Math.cos(angle);
    },
  };
}
