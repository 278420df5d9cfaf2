// manifest.json read back for verify and review: every field they rely on is checked, and a
// manifest from before inputs carried `from_output` is named as such rather than half-verified.
// An input's `copy` is optional (manifests written before memo folders carried their inputs
// lack it) but, when present, must lie under inputs/ in the memo folder. Only a regular file
// of bounded size is read, so a FIFO or a device in its place is refused, never waited on.
import { InputError, type InputProblem } from '../base/problem.js';
import { MAX_RUN_DOCUMENT_BYTES, regularFileBytes } from '../base/readRegularFile.js';
import { INPUTS_FOLDER } from './inputCopies.js';
import { verifyMessages } from './messages.js';
import { MANIFEST_SCHEMA, type InputRole, type Manifest, type ManifestInput, type ManifestOutput } from './manifest.js';

const ROLES: readonly InputRole[] = ['config', 'data', 'earlier-record'];
const HASH = /^[0-9a-f]{64}$/;

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function text(value: unknown): value is string {
  return typeof value === 'string' && value !== '';
}

function isRole(value: unknown): value is InputRole {
  return ROLES.some((role) => role === value);
}

function isHash(value: unknown): value is string {
  return typeof value === 'string' && HASH.test(value);
}

/** A copy lies inside the memo folder, under inputs/: nothing a manifest says can point verify elsewhere. */
function isCopyPlace(value: unknown): value is string {
  return typeof value === 'string' && value.startsWith(`${INPUTS_FOLDER}/`) && !value.includes('\\') && value.split('/').every((part) => part !== '' && part !== '.' && part !== '..');
}

export function readManifest(file: string, shown: string): Manifest {
  const bytes = regularFileBytes(file, MAX_RUN_DOCUMENT_BYTES);
  if (bytes === null) throw new InputError(verifyMessages.badManifest(shown, 'manifest.json', 'a regular file of JSON'));
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch {
    throw new InputError(verifyMessages.badManifest(shown, 'manifest.json', 'JSON'));
  }
  const problems: InputProblem[] = [];
  const bad = (field: string, expected: string) => problems.push(verifyMessages.badManifest(shown, field, expected));
  if (!isObject(value)) throw new InputError(verifyMessages.badManifest(shown, 'manifest.json', 'a JSON object'));
  if (value.schema !== MANIFEST_SCHEMA) bad('schema', `"${MANIFEST_SCHEMA}"`);
  const { tool, run_date: runDate, command } = value;
  const toolName = isObject(tool) && text(tool.name) ? tool.name : '';
  const toolVersion = isObject(tool) && text(tool.version) ? tool.version : '';
  if (toolName === '' || toolVersion === '') bad('tool', 'a name and a version');
  if (typeof runDate !== 'string' || !/^\d{4}-\d\d-\d\d$/.test(runDate)) bad('run_date', 'a date written YYYY-MM-DD');
  if (!text(command)) bad('command', 'the command of the run');
  const inputs: ManifestInput[] = [];
  if (!Array.isArray(value.inputs) || value.inputs.length === 0) bad('inputs', 'a list of the run’s inputs');
  else {
    value.inputs.forEach((input: unknown, i: number) => {
      const field = `inputs[${i}]`;
      if (!isObject(input) || !isRole(input.role) || !text(input.path) || !isHash(input.sha256)) {
        bad(field, 'an input with a role, a path and a SHA-256');
      } else if (!text(input.from_output)) {
        problems.push(verifyMessages.noInputLocation(shown, field));
      } else if (input.copy !== undefined && !isCopyPlace(input.copy)) {
        bad(`${field}.copy`, `a place under ${INPUTS_FOLDER}/ in the memo folder`);
      } else {
        const copy = input.copy === undefined ? {} : { copy: input.copy };
        inputs.push({ role: input.role, path: input.path, from_output: input.from_output, sha256: input.sha256, ...copy });
      }
    });
    if (problems.length === 0 && inputs.filter((input) => input.role === 'config').length !== 1) bad('inputs', 'a list with one config');
  }
  const outputs: ManifestOutput[] = [];
  if (!Array.isArray(value.outputs)) bad('outputs', 'a list of the files written');
  else {
    value.outputs.forEach((output: unknown, i: number) => {
      // Outputs are plain names in the memo folder: nothing a manifest says can point verify elsewhere.
      if (!isObject(output) || !text(output.file) || /[/\\]|^\./.test(output.file) || !isHash(output.sha256) || typeof output.bytes !== 'number') {
        bad(`outputs[${i}]`, 'a file name in the memo folder with its SHA-256 and size');
      } else {
        outputs.push({ file: output.file, sha256: output.sha256, bytes: output.bytes });
      }
    });
  }
  if (problems.length > 0 || typeof runDate !== 'string' || typeof command !== 'string') throw new InputError(problems);
  return { schema: MANIFEST_SCHEMA, tool: { name: toolName, version: toolVersion }, run_date: runDate, command, inputs, outputs };
}
