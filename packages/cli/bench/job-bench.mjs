// A whole job, timed and weighed: `girth run` on a job of PIECES pieces (the
// demo's six joints repeated, each with its own label), in a fresh process.
// Prints, with the machine's load beside them:
//   - the run's wall clock, CPU time (user + system) and peak memory (max RSS),
//     from the child's own resource usage;
//   - the split of the compute: start-up (`girth --version`'s CPU), reading and
//     checking the job, layout, export and writing (this process, the same
//     library calls `girth run` makes).
// Goals (issue 17): 1,000 pieces under 2 s of compute; 100,000 pieces with
// peak memory under 300 MB (`node bench/job-bench.mjs 100000`).
// A figure to watch, not a test.
// Usage: node bench/job-bench.mjs [PIECES] [RUNS] [OUTPUTS, e.g. csv or svg,dxf,csv]
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));
const bin = join(here, '..', 'bin', 'girth.js');
const pieces = Number(process.argv[2] ?? 1000);
const runs = Number(process.argv[3] ?? (pieces > 10_000 ? 1 : 3));
const outputs = process.argv[4]?.split(',');
const demo = JSON.parse(readFileSync(join(here, '..', '..', '..', 'fixtures', 'demo', 'job.json'), 'utf8'));

const tmp = mkdtempSync(join(tmpdir(), 'girth-job-bench-'));
const jobPath = join(tmp, 'job.json');
const d = demo.pieces;
writeFileSync(
  jobPath,
  JSON.stringify({ ...demo, ...(outputs ? { outputs } : {}), pieces: Array.from({ length: pieces }, (_, i) => ({ ...d[i % d.length], piece: `SP-${i + 1} ${d[i % d.length].piece}` })) }),
);

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const load = () => `load average ${loadavg()[0].toFixed(1)} on ${cpus().length} cores`;

/** Runs node with args under /usr/bin/time -v: wall s, CPU s, max RSS MB. */
function timed(args) {
  const r = spawnSync('/usr/bin/time', ['-v', process.execPath, ...args], { encoding: 'utf8', maxBuffer: 1 << 30 });
  if (r.status !== 0) throw new Error(`${args.join(' ')}: exit ${r.status}\n${r.stderr.slice(-2000)}`);
  const field = (name) => Number(new RegExp(`${name}: ([0-9.:]+)`).exec(r.stderr)?.[1].split(':').reduce((acc, v) => acc * 60 + Number(v), 0));
  return {
    wallS: field('Elapsed \\(wall clock\\) time \\(h:mm:ss or m:ss\\)'),
    cpuS: field('User time \\(seconds\\)') + field('System time \\(seconds\\)'),
    rssMb: field('Maximum resident set size \\(kbytes\\)') / 1024,
  };
}

console.log(`job-bench: girth run, ${pieces} pieces (${d.length} joints of the demo job repeated), outputs ${outputs?.join(', ') ?? 'svg, dxf, csv'}, median of ${runs}; node ${process.version}; ${load()}`);
const whole = [];
for (let i = 0; i < runs; i++) {
  const out = join(tmp, `out-${i}`);
  whole.push(timed([bin, 'run', jobPath, '--out', out]));
  rmSync(out, { recursive: true, force: true });
}
console.log(
  `girth run: wall ${median(whole.map((w) => w.wallS)).toFixed(2)} s, CPU ${median(whole.map((w) => w.cpuS)).toFixed(2)} s (goal at 1,000 pieces: under 2 s), peak memory ${median(whole.map((w) => w.rssMb)).toFixed(0)} MB (goal at 100,000 pieces: under 300 MB); ${load()}`,
);

// The split, measured in this process with the calls `girth run` makes.
const startup = median(Array.from({ length: 5 }, () => timed([bin, '--version']).cpuS));
const { parseJob } = await import('../dist/job/schema.js');
const { readJobFile } = await import('../dist/job/read-job-file.js');
const { jobFileSource } = await import('../dist/job/stream-job.js');
const { writeJobFolder } = await import('../dist/job/write-job-folder.js');
const splits = [];
for (let i = 0; i < runs; i++) {
  const out = join(tmp, `split-${i}`);
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const job = parseJob(await readJobFile(jobPath));
  const t1 = performance.now();
  const timing = { layoutMs: 0, exportMs: 0 };
  await writeJobFolder(out, jobFileSource(job, out, timing), { force: false });
  const t2 = performance.now();
  const c = process.cpuUsage(c0);
  splits.push({ readMs: t1 - t0, layoutMs: timing.layoutMs, exportMs: timing.exportMs, writeMs: t2 - t1 - timing.layoutMs - timing.exportMs, cpuMs: (c.user + c.system) / 1000 });
  rmSync(out, { recursive: true, force: true });
}
const m = (k) => median(splits.map((s) => s[k]));
console.log(
  `split (wall ms, this process): start-up ${(startup * 1000).toFixed(0)} (CPU of girth --version), read+check ${m('readMs').toFixed(0)}, layout ${m('layoutMs').toFixed(0)}, export ${m('exportMs').toFixed(0)}, writing ${m('writeMs').toFixed(0)}; CPU ${m('cpuMs').toFixed(0)} ms; ${((m("layoutMs") + m("exportMs")) / pieces).toFixed(2)} ms a piece laid out and exported; ${load()}`,
);
rmSync(tmp, { recursive: true, force: true });
