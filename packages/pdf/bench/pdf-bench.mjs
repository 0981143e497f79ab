// Benchmark: the time to write PDFs (median of several runs, after warm-up).
// 1. An NPS 24 STD lateral's wrap (45° on NPS 24 STD), tiled on Letter. Target: under 50 ms.
// 2. A 20-piece job packet on Letter: a cover, then each piece's sheets and a
//    table page. Target: under 1 s. Layouts are made beforehand and not timed.
// Needs the build (pnpm bench builds first). Run: pnpm --filter @girth/pdf run bench
import { planTiles, planToPdf, writePdf } from '@girth/pdf';
import { planSheet } from '@girth/sheet';
import { layoutBranch, layoutMiter, layoutPlaneCut } from '@girth/unroll';

const pipe = (nps, odMm, wallMm) => ({ odMm, wallMm, label: `NPS ${nps} STD` });
// ODs and STD walls of ASME B36.10M.
const NPS = {
  4: pipe(4, 114.3, 6.02),
  6: pipe(6, 168.275, 7.112),
  8: pipe(8, 219.075, 8.179),
  12: pipe(12, 323.85, 9.525),
  24: pipe(24, 609.6, 9.525),
};

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

async function time(runs, warm, fn) {
  for (let i = 0; i < warm; i++) await fn();
  const ms = [];
  const cpu = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    const c = process.cpuUsage();
    await fn();
    const used = process.cpuUsage(c);
    cpu.push((used.user + used.system) / 1000);
    ms.push(performance.now() - t);
  }
  // CPU time as well: on a shared, loaded machine the wall time mostly measures waiting.
  return { median: median(ms), min: Math.min(...ms), cpu: median(cpu) };
}

const wrap = layoutBranch({ header: NPS[24], branch: NPS[24], angleDeg: 45 }).templates[0];
const wrapPlan = planSheet(wrap, { sheetUnits: 'in', job: 'J-7730', piece: 'SP-14 lateral' });
const tiles = planTiles(wrapPlan.page.widthMm, wrapPlan.page.heightMm, { paper: 'letter' });
let bytes = 0;
const one = await time(15, 3, async () => {
  bytes = (await planToPdf(wrapPlan, { paper: 'letter' })).length;
});
console.log(
  `NPS 24 lateral wrap on Letter (${Math.round(wrapPlan.page.widthMm)} x ${Math.round(wrapPlan.page.heightMm)} mm, ${tiles.pageCount} pages, ${Math.round(bytes / 1024)} KiB): median ${one.median.toFixed(1)} ms, min ${one.min.toFixed(1)} ms, CPU ${one.cpu.toFixed(1)} ms (target < 50 ms)`,
);

// Twenty pieces: tees, laterals, cut-backs and miters on NPS 4 to 12, each with its table page.
const layouts = [];
const sizes = [4, 6, 8, 12];
for (let i = 0; i < 20; i++) {
  const p = NPS[sizes[i % 4]];
  const kind = i % 4;
  const layout =
    kind === 0 ? layoutBranch({ header: NPS[12], branch: NPS[sizes[i % 3]], angleDeg: 90 })
    : kind === 1 ? layoutBranch({ header: NPS[12], branch: NPS[sizes[i % 3]], angleDeg: 45 })
    : kind === 2 ? layoutPlaneCut({ pipe: p, angleDeg: 45 + i })
    : layoutMiter({ pipe: { ...p, npsIn: sizes[i % 4] }, bendDeg: 90, pieces: 4, radiusNps: 1.5 });
  layouts.push({ piece: `SP-${String(i + 1).padStart(2, '0')}`, layout });
}
const parts = [{ kind: 'text', title: 'Job packet: J-7730', lines: layouts.map((l) => `${l.piece}  ${l.layout.kind}  ${l.layout.templates.map((t) => t.id).join(', ')}`) }];
for (const { piece, layout } of layouts) {
  for (const t of layout.templates) parts.push({ kind: 'sheet', plan: planSheet(t, { sheetUnits: 'in', job: 'J-7730', piece }) });
  const rows = layout.templates.flatMap((t) => t.stations.map((s) => `${t.id} ${s.n} ${Object.values(s.values).map((v) => v.toFixed(1)).join(' ')}`));
  parts.push({ kind: 'text', title: `${piece}: ordinate tables`, lines: rows });
}
let packetPages = 0;
let packetBytes = 0;
const packet = await time(5, 1, async () => {
  const pdf = await writePdf(parts, { paper: 'letter' });
  packetBytes = pdf.length;
});
for (const p of parts) if (p.kind === 'sheet') packetPages += planTiles(p.plan.page.widthMm, p.plan.page.heightMm, { paper: 'letter' }).pageCount;
console.log(
  `20-piece job packet on Letter (${parts.filter((p) => p.kind === 'sheet').length} sheets, ${packetPages} sheet pages, ${Math.round(packetBytes / 1024)} KiB): median ${packet.median.toFixed(0)} ms, min ${packet.min.toFixed(0)} ms, CPU ${packet.cpu.toFixed(0)} ms (target < 1 s)`,
);
