// Seeded standard normal draws for simulation tests, so every run draws the same series: the
// tool's own generator (src/linalg/seededNormals.ts), which the yearly figure's simulation uses.
export { seededNormals } from '../../src/linalg/seededNormals.js';
