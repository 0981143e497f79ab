/**
 * Bundles a module for the browser with Vite (the bundler the page uses) and
 * reports every Node built-in the bundle would need. Vite itself only warns and
 * swaps such imports for an empty stub, so the check is a resolve hook that
 * records them, plus a scan of the output for Vite's stub.
 */
import { builtinModules } from 'node:module';
import { build, type Plugin, type Rollup } from 'vite';

/** What a browser bundle came to: its code and the Node built-ins it asked for. */
export interface BrowserBundle {
  readonly code: string;
  /** `<built-in> (imported by <file>)`, one per import. */
  readonly nodeBuiltins: readonly string[];
}

const BUILTINS = new Set(builtinModules);

function isNodeBuiltin(id: string): boolean {
  if (id.startsWith('node:')) return true;
  return BUILTINS.has(id) || BUILTINS.has(id.split('/')[0] ?? '');
}

/**
 * Bundles `entryFile` for the browser (ES modules, not minified), resolving
 * workspace packages through `conditions` first.
 */
export async function bundleForBrowser(entryFile: string, rootDir: string, conditions: readonly string[]): Promise<BrowserBundle> {
  const nodeBuiltins: string[] = [];
  const recordBuiltins: Plugin = {
    name: 'girth-record-node-builtins',
    enforce: 'pre',
    resolveId(id, importer) {
      if (isNodeBuiltin(id)) nodeBuiltins.push(`${id} (imported by ${importer ?? 'the entry'})`);
      return null;
    },
  };
  const result = await build({
    configFile: false,
    root: rootDir,
    logLevel: 'silent',
    plugins: [recordBuiltins],
    resolve: { conditions: [...conditions, 'module', 'browser', 'production'] },
    build: {
      write: false,
      minify: false,
      target: 'es2022',
      lib: { entry: entryFile, formats: ['es'], fileName: 'girth-browser' },
    },
  });
  const outputs = (Array.isArray(result) ? result : [result]) as Rollup.RollupOutput[];
  const code = outputs
    .flatMap((o) => o.output)
    .map((chunk) => (chunk.type === 'chunk' ? chunk.code : ''))
    .join('\n');
  if (code.includes('__vite-browser-external')) nodeBuiltins.push('a Node built-in Vite stubbed out (__vite-browser-external)');
  return { code, nodeBuiltins };
}
