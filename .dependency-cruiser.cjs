// The import rules of src/, checked by `npm test` (npm run deps). Stages import one way, from the
// right of the pipeline picture to the left (DEVELOPERS.md, "The pipeline"):
//
//   linalg ◀─ base ◀─ config
//                  ◀─ data
//                  ◀─ statespace ◀─ models ◀─ evidence ◀─┐
//                                          ◀─ backtest ◀─┴─ analysis ◀─ memo (record types only)
//   run ─▶ config, data, analysis, memo        cli ─▶ run and the stages it drives        index ─▶ the public API
//
// A rule names, for each stage, the stages it may import; everything else in src/ is refused.
const stages = {
  linalg: [],
  base: ['linalg'],
  config: ['base'],
  data: ['base'],
  statespace: ['base', 'linalg'],
  models: ['base', 'linalg', 'statespace'],
  evidence: ['base', 'linalg', 'statespace', 'models'],
  backtest: ['base', 'linalg', 'statespace', 'models'],
  analysis: ['base', 'linalg', 'models', 'evidence', 'backtest'],
  memo: ['base', 'analysis'],
  run: ['base', 'config', 'data', 'analysis', 'memo'],
  cli: ['base', 'config', 'data', 'analysis', 'run', 'memo'],
};

const stageRules = Object.entries(stages).map(([stage, allowed]) => ({
  name: `${stage}-imports-to-its-left`,
  comment: `src/${stage}/ may import only from ${[stage, ...allowed].map((s) => `src/${s}/`).join(', ')}.`,
  severity: 'error',
  from: { path: `^src/${stage}/` },
  to: { path: '^src/', pathNot: `^src/(${[stage, ...allowed].join('|')})/` },
}));

module.exports = {
  forbidden: [
    ...stageRules,
    {
      name: 'memo-reads-the-record-only',
      comment: 'The memo computes no statistics: of the analysis stages it reads src/analysis/record.ts, the types of the record, and nothing else.',
      severity: 'error',
      from: { path: '^src/memo/' },
      to: { path: '^src/analysis/', pathNot: '^src/analysis/record\\.ts$' },
    },
    {
      name: 'no-circular',
      comment: 'Modules that import each other, even for types only, are one concept split in two.',
      severity: 'error',
      from: {},
      to: { circular: true },
    },
    {
      name: 'no-unreachable',
      comment: 'Every module is reached from the public API, src/index.ts, which includes the command line; one that is not is dead code.',
      severity: 'error',
      from: { path: '^src/index\\.ts$' },
      to: { path: '^src/', reachable: false },
    },
    {
      name: 'no-dev-dependencies-in-src',
      comment: 'What ships may not need what only the tests install.',
      severity: 'error',
      from: { path: '^src/' },
      to: { dependencyTypes: ['npm-dev'] },
    },
    {
      name: 'no-unresolvable',
      severity: 'error',
      from: {},
      to: { couldNotResolve: true },
    },
  ],
  options: {
    parser: 'swc',
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    doNotFollow: { path: 'node_modules' },
    enhancedResolveOptions: { exportsFields: ['exports'], conditionNames: ['import', 'require', 'node', 'default', 'types'] },
    exclude: { path: '^(test|dist|node_modules)/' },
  },
};
