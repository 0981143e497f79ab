import { describe, expect, it } from 'vitest';
import type { Template } from '@girth/unroll';
import { stationTableCsv } from './station-table-csv.js';
import { parseCsv } from './test-support/csv-parse.js';
import { INCH, planeCutWrap } from './test-support/fixtures.js';

const NPS6 = planeCutWrap(6.625 * INCH, 22.5); // OD 6.625 in, ASME B36.10M (recalled)

describe('stationTableCsv', () => {
  it('writes a header row and one record per station, CR LF, RFC 4180 quoting', () => {
    const csv = stationTableCsv(NPS6, { format: 'ft-in' });
    expect(csv.endsWith('\r\n')).toBe(true);
    expect(csv.split('\r\n')[0]).toBe('Station,Angle (deg),Girth,Cutback');
    // 2 3/4" holds a double quote: quoted, inner quote doubled (RFC 4180, 2.7).
    expect(csv.split('\r\n')[9]).toBe('9,180.0,"10 7/16""","2 3/4"""');
    const records = parseCsv(csv);
    expect(records).toHaveLength(17);
    expect(records[9]).toEqual(['9', '180.0', '10 7/16"', '2 3/4"']);
  });

  it('quotes hostile headings so they stay one field', () => {
    const hostile: Template = {
      ...NPS6,
      stationColumns: [
        { key: 'girth', heading: 'Girth, "around"\r\nthe OD', quantity: 'length' },
        { key: 'cutback', heading: '=HYPERLINK("http://example.invalid","x")', quantity: 'length' },
      ],
    };
    const records = parseCsv(stationTableCsv(hostile, { format: 'mm' }));
    expect(records).toHaveLength(17);
    expect(records.every((r) => r.length === 4)).toBe(true);
    expect(records[0]![2]).toBe('Girth, "around"\r\nthe OD');
    // A heading that would start a spreadsheet formula is prefixed with ' (OWASP, "CSV Injection").
    expect(records[0]![3]).toBe(`'=HYPERLINK("http://example.invalid","x")`);
  });

  it('writes decimal values unquoted when they need no quotes', () => {
    const records = parseCsv(stationTableCsv(NPS6, { format: 'mm' }));
    // Station 5 at 90°: girth pi x 168.275 / 4 = 132.163 mm, cutback 84.1375 tan 22.5° = 34.851 mm.
    expect(records[5]).toEqual(['5', '90.0', '132.2 mm', '34.9 mm']);
  });
});
