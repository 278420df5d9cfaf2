// Config text → RunPlan, or one InputError carrying every problem in the order they appear:
//   readYamlTree (syntax, aliases) → validateNode (every key against CONFIG_SPEC)
//   → checkConfigRules (rules across keys) → buildRunPlan (merge, sources, paths)
import { createHash } from 'node:crypto';
import { resolve } from 'node:path';
import { limitProblems } from '../base/limitProblems.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { configMessages } from './messages.js';
import { buildRunPlan } from './buildRunPlan.js';
import { checkConfigRules } from './checkConfigRules.js';
import { CONFIG_SPEC, type ConfigDocument, type Loose } from './configSpec.js';
import { readYamlTree } from './readYamlTree.js';
import type { RunPlan } from './runPlan.js';
import { validateNode, type Validation } from './validateNode.js';

function byPosition(a: InputProblem, b: InputProblem): number {
  return (a.line ?? Infinity) - (b.line ?? Infinity) || (a.column ?? 0) - (b.column ?? 0);
}

/**
 * Pure: reads nothing from disk. `file` names the config in messages; relative paths in the
 * config are resolved against `baseDir`.
 */
export function parseConfig(text: string, file: string, baseDir: string): RunPlan {
  const tree = readYamlTree(text, file);
  const { root } = tree;
  if (root === undefined || (root.kind === 'scalar' && root.value === null)) {
    throw new InputError(tree.problems.length > 0 ? tree.problems : [configMessages.empty(file)]);
  }
  const v: Validation = { file, problems: [...tree.problems], positions: new Map() };
  // The validator guarantees this shape: valid keys present, failed ones absent.
  const loose = validateNode(CONFIG_SPEC, root, '', v) as Loose<ConfigDocument> | undefined;
  if (loose !== undefined) checkConfigRules(loose, v);
  if (v.problems.length > 0 || loose === undefined) throw new InputError(limitProblems([...v.problems].sort(byPosition)));
  return buildRunPlan(loose as ConfigDocument, {
    configFile: file,
    configSha256: createHash('sha256').update(text, 'utf8').digest('hex'),
    baseDir: resolve(baseDir),
    positions: v.positions,
  });
}
