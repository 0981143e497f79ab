/**
 * Reading a DXF back with two independent readers: dxf-parser (JavaScript) and
 * ezdxf (Python, Debian's python3-ezdxf run as /usr/bin/python3), whose audit
 * must find no errors.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import DxfParser from 'dxf-parser';
import type { IDxf } from 'dxf-parser';

/** The DXF parsed by dxf-parser (throws on malformed files). */
export function parseDxf(text: string): IDxf {
  const parsed = new DxfParser().parseSync(text);
  if (parsed === null) throw new Error('dxf-parser returned nothing');
  return parsed;
}

/** What ezdxf saw in one file. */
export interface EzdxfReport {
  readonly hasErrors: boolean;
  readonly errors: readonly string[];
  readonly dxfversion: string;
  readonly insunits: number | null;
  readonly layers: Readonly<Record<string, number>>;
  /** Entity type counts in modelspace, e.g. `{ LWPOLYLINE: 1, TEXT: 5 }`. */
  readonly counts: Readonly<Record<string, number>>;
  /** Closed polylines (LWPOLYLINE or POLYLINE) per layer. */
  readonly closedByLayer: Readonly<Record<string, number>>;
  /** Plain text of every TEXT entity, in order. */
  readonly texts: readonly string[];
}

const EZDXF_SCRIPT = String.raw`
import json, sys, ezdxf
out = {}
for path in sys.argv[1:]:
    doc = ezdxf.readfile(path)
    a = doc.audit()
    msp = doc.modelspace()
    counts, closed, texts = {}, {}, []
    for e in msp:
        t = e.dxftype()
        counts[t] = counts.get(t, 0) + 1
        if t in ('LWPOLYLINE', 'POLYLINE') and e.is_closed:
            closed[e.dxf.layer] = closed.get(e.dxf.layer, 0) + 1
        if t == 'TEXT':
            texts.append(e.dxf.text)
    out[path] = {
        'hasErrors': bool(a.has_errors),
        'errors': [str(x.message) for x in a.errors],
        'dxfversion': doc.dxfversion,
        'insunits': doc.header.get('$INSUNITS'),
        'layers': {l.dxf.name: l.dxf.color for l in doc.layers},
        'counts': counts,
        'closedByLayer': closed,
        'texts': texts,
    }
print(json.dumps(out))
`;

/**
 * Audits DXF texts with ezdxf in one Python run; returns a report per name.
 * Files go to a fresh temp dir that is removed afterwards.
 */
export function auditWithEzdxf(files: Readonly<Record<string, string>>): Record<string, EzdxfReport> {
  const dir = mkdtempSync(join(tmpdir(), 'girth-dxf-'));
  try {
    const paths = Object.entries(files).map(([name, text]) => {
      const p = join(dir, `${name}.dxf`);
      writeFileSync(p, text, 'utf8');
      return [name, p] as const;
    });
    const run = spawnSync('/usr/bin/python3', ['-c', EZDXF_SCRIPT, ...paths.map(([, p]) => p)], { encoding: 'utf8' });
    if (run.status !== 0) throw new Error(`ezdxf failed: ${run.stderr || run.error?.message}`);
    const all = JSON.parse(run.stdout) as Record<string, EzdxfReport>;
    return Object.fromEntries(paths.map(([name, p]) => [name, all[p]!]));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
