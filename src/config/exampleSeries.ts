// The invented series `trendbrief init` writes beside its starter config: yearly boardings of a
// fictional ferry service, a random walk with drift drawn from a fixed seed, so every init writes
// the same file.

// Long enough for the default backtest: 20 origins after the shortest training window (27
// observations at the default order limits) for a five-year horizon.
export const EXAMPLE_FIRST_YEAR = 1974;
export const EXAMPLE_YEARS = 52;

/** Uniform draws in [0, 1) from a 32-bit linear congruential generator (Numerical Recipes, ch. 7 constants). */
function uniforms(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/** Standard normal draws by the Box-Muller transform (Box & Muller 1958). */
function normals(seed: number): () => number {
  const uniform = uniforms(seed);
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

/** `year,boardings` lines with a header, boardings in thousands to one decimal. */
export function exampleSeriesCsv(seed = 20_260_101): string {
  const draw = normals(seed);
  const lines = ['year,boardings'];
  let level = 95;
  for (let i = 0; i < EXAMPLE_YEARS; i++) {
    level += 4.5 + 7 * draw();
    lines.push(`${EXAMPLE_FIRST_YEAR + i},${level.toFixed(1)}`);
  }
  return `${lines.join('\n')}\n`;
}
