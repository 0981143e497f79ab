// Start-up time of the built `girth` command: runs each command line several
// times in a fresh Node process and prints the median and the fastest, in ms.
// A figure to watch, not a test: `pnpm bench` prints it (goal: --help under 120 ms).
// Also prints how many modules each command loads (zod among them or not).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

const here = fileURLToPath(new URL('.', import.meta.url));
const bin = join(here, '..', 'bin', 'girth.js');
const runs = Number(process.env.STARTUP_RUNS ?? 15);

const cases = [
  ['node -e ""  (Node alone)', ['-e', '']],
  ['girth --help', [bin, '--help']],
  ['girth --version', [bin, '--version']],
  ['girth pipe "NPS 6 STD"', [bin, 'pipe', 'NPS 6 STD']],
  ['girth branch (table)', [bin, 'branch', '--header', 'NPS 12 STD', '--branch', 'NPS 6 STD']],
  ['girth run --help', [bin, 'run', '--help']],
];

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

console.log(`girth start-up, ${runs} runs each, wall-clock ms (node ${process.version}); "over node" subtracts Node's own start-up`);
let nodeAlone;
for (const [name, args] of cases) {
  const times = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    const r = spawnSync(process.execPath, args, { encoding: 'utf8' });
    const t1 = process.hrtime.bigint();
    if (r.status !== 0) {
      console.error(`${name}: exit ${r.status}\n${r.stderr}`);
      process.exitCode = 1;
      break;
    }
    times.push(Number(t1 - t0) / 1e6);
  }
  if (times.length === 0) continue;
  const m = median(times);
  nodeAlone ??= m;
  const over = name.startsWith('girth') ? `  over node ${(m - nodeAlone).toFixed(1).padStart(6)}` : '';
  console.log(`${name.padEnd(30)} median ${m.toFixed(1).padStart(6)}  min ${Math.min(...times).toFixed(1).padStart(6)}${over}`);
}

// What each command loads: a module hook prints every module Node loads.
const hooks = "export async function load(u, c, next) { process.stderr.write('@@m ' + u + '\\n'); return next(u, c); }";
const probeImport =
  'data:text/javascript,' +
  encodeURIComponent(`import { register } from 'node:module'; register(${JSON.stringify('data:text/javascript,' + encodeURIComponent(hooks))});`);
const probe = (args) => {
  const r = spawnSync(process.execPath, ['--import', probeImport, ...args], { encoding: 'utf8' });
  const loaded = r.stderr.split('\n').filter((l) => l.startsWith('@@m ') && !l.startsWith('@@m node:'));
  // zod is bundled into the chunk of `girth run` (scripts/bundle-bin.mjs); count that chunk or zod's own files.
  const zod = loaded.filter((l) => /[\\/]zod[\\/]|[\\/]run-command-[^\\/]*\.js$/.test(l)).length;
  return `${String(loaded.length).padStart(4)} modules loaded, ${zod} of them zod (or the run chunk holding it)`;
};
for (const [name, args] of cases.slice(1)) console.log(`${name.padEnd(30)} ${probe(args)}`);
