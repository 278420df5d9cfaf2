// The module a worker thread loads for a task function: the compiled .js beside the caller
// under dist/, or, when running from the TypeScript sources (tests, benchmarks), a small
// inline module that registers tsx before importing the .ts file: Node 20 hands neither the
// parent's loader hooks nor an `--import` in execArgv to worker threads.
export function workerModule(callerUrl: string, baseName: string, exportName: string): string {
  if (!callerUrl.endsWith('.ts')) return new URL(`./${baseName}.js`, callerUrl).href;
  const tsxApi = import.meta.resolve('tsx/esm/api');
  const source = new URL(`./${baseName}.ts`, callerUrl).href;
  const entry = `const { register } = await import(${JSON.stringify(tsxApi)}); register(); export const { ${exportName} } = await import(${JSON.stringify(source)});`;
  return `data:text/javascript,${encodeURIComponent(entry)}`;
}
