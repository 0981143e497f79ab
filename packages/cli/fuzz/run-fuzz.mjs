// `pnpm fuzz [COUNT] [SEED]`: COUNT random joints (default 100,000) through
// every exporter, against the built packages. Prints joints per second and
// the totals; a sample of DXF files is audited by ezdxf (Debian's
// python3-ezdxf as /usr/bin/python3). Exits 1 on any exception, NaN or
// Infinity, unparsable file, or late refusal (a joint laid out, then refused by
// an exporter). Target: 100,000 joints with none of these.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { join } from 'node:path';
import { fuzzJoints } from './fuzz-joints.mjs';

const count = Number(process.argv[2] ?? 100_000);
const seed = Number(process.argv[3] ?? 20_261_202);
if (!Number.isInteger(count) || count < 1 || !Number.isInteger(seed)) {
  console.error('usage: pnpm fuzz [COUNT] [SEED]');
  process.exit(2);
}
console.log(`fuzz: ${count} joints from seed ${seed}; node ${process.version}, load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores`);

const chunk = 10_000;
const sum = { joints: 0, laidOut: 0, refused: 0, lateRefusals: 0, templates: 0, files: 0, exceptions: 0, nonFinite: 0, parsed: 0, unparsable: 0 };
const problems = [];
const late = [];
const dxf = [];
let ms = 0;
for (let done = 0, part = 0; done < count; done += chunk, part++) {
  const n = Math.min(chunk, count - done);
  const res = fuzzJoints({ count: n, seed: seed + part, sampleEvery: 25, keepDxf: 10 });
  for (const k of Object.keys(sum)) sum[k] += res.totals[k];
  problems.push(...res.problems.map((p) => `seed ${seed + part} ${p}`));
  late.push(...res.late.map((p) => `seed ${seed + part} ${p}`));
  dxf.push(...res.keptDxf);
  ms += res.ms;
  console.log(`  ${done + n} joints, ${Math.round(((done + n) / ms) * 1000)} joints/s so far; exceptions ${sum.exceptions}, NaN/Infinity ${sum.nonFinite}, unparsable ${sum.unparsable}, late refusals ${sum.lateRefusals}`);
}

let audited = 0;
let auditErrors = 0;
const dir = mkdtempSync(join(os.tmpdir(), 'girth-fuzz-'));
try {
  const paths = dxf.map((d, i) => {
    const p = join(dir, `${i}.dxf`);
    writeFileSync(p, d.content);
    return p;
  });
  const script = 'import sys, ezdxf\nbad = 0\nfor p in sys.argv[1:]:\n    a = ezdxf.readfile(p).audit()\n    bad += 1 if a.has_errors else 0\nprint(bad)\n';
  const run = spawnSync('/usr/bin/python3', ['-c', script, ...paths], { encoding: 'utf8' });
  if (run.status === 0) {
    audited = paths.length;
    auditErrors = Number(run.stdout.trim());
  } else {
    console.log(`  ezdxf audit skipped: ${(run.stderr || run.error?.message || '').split('\n').filter(Boolean).pop()}`);
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}

console.log(
  `fuzz: ${sum.joints} joints in ${(ms / 1000).toFixed(1)} s = ${Math.round((sum.joints / ms) * 1000)} joints/s; ` +
    `${sum.laidOut} laid out (${sum.templates} templates, ${sum.files} files checked for NaN/Infinity), ${sum.refused} refused with a GirthError, ${sum.lateRefusals} refused only by an exporter; ` +
    `exceptions ${sum.exceptions}, NaN/Infinity ${sum.nonFinite}, unparsable ${sum.unparsable} of ${sum.parsed} parsed (svgson, dxf-parser), ` +
    `ezdxf audit errors ${auditErrors} of ${audited}`,
);
for (const p of problems.slice(0, 20)) console.log(`  problem ${p}`);
for (const p of late.slice(0, 5)) console.log(`  late refusal ${p}`);
process.exitCode = sum.exceptions + sum.nonFinite + sum.unparsable + sum.lateRefusals + auditErrors === 0 ? 0 : 1;
