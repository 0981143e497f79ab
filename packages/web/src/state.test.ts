import { describe, expect, it } from 'vitest';
import { JOINT_NAMES } from './fields.js';
import { jobToStates, stateToJob } from './job-file.js';
import { initialState } from './page-state.js';
import { MAX_RECENT, readRecent, rememberJob, RECENT_KEY, type RecentStore } from './recent.js';
import { hashToState, stateToHash } from './state-url.js';
import { parseCsv } from './csv.js';

function memoryStore(): RecentStore & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return { data, getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v) };
}

describe('the link', () => {
  it.each(JOINT_NAMES)('%s: the state survives the URL fragment unchanged', (joint) => {
    const state = { ...initialState(joint), job: 'Job 7 & co #2', piece: 'SP/3 = "tee"', units: 'mm' as const };
    expect(hashToState(stateToHash(state))).toEqual(state);
  });

  it('a fragment without a known joint is no state; unknown words fall back to a fresh form', () => {
    expect(hashToState('#joint=flange')).toBeUndefined();
    const s = hashToState('#joint=cutback&units=cm&fraction=64&pipe=6%20std');
    expect(s?.units).toBe('in');
    expect(s?.fraction).toBe('16');
    expect(s?.fields.pipe).toBe('6 std');
  });
});

describe('recent jobs', () => {
  it('newest first, once each, at most MAX_RECENT', () => {
    const store = memoryStore();
    for (let i = 0; i < MAX_RECENT + 3; i++) rememberJob(store, { name: `job ${i}`, hash: `h${i}` });
    rememberJob(store, { name: 'job 5 again', hash: 'h5' });
    const list = readRecent(store);
    expect(list.length).toBe(MAX_RECENT);
    expect(list[0]).toEqual({ name: 'job 5 again', hash: 'h5' });
    expect(list.filter((r) => r.hash === 'h5').length).toBe(1);
  });

  it('a damaged entry reads as no list, and a storage that refuses to write is ignored', () => {
    const store = memoryStore();
    store.data.set(RECENT_KEY, '{not json');
    expect(readRecent(store)).toEqual([]);
    const full: RecentStore = { getItem: () => null, setItem: () => { throw new Error('QuotaExceededError'); } };
    expect(rememberJob(full, { name: 'a', hash: 'b' })).toEqual([{ name: 'a', hash: 'b' }]);
  });
});

describe('job files', () => {
  it.each(JOINT_NAMES)('%s: the form saved as a job file (checked by the command line\'s schema) opens as the same form', (joint) => {
    const state = { ...initialState(joint), job: 'Job 8812 - Halden mill', piece: 'HM-2 SP-7', stations: '24' };
    const job = stateToJob(state);
    expect(job.pieces[0]!.joint).toBe(joint);
    expect(jobToStates(JSON.parse(JSON.stringify(job)))).toEqual([state]);
  });

  it('a job the schema refuses throws its GirthError naming the key', () => {
    expect(() => jobToStates({ job: 'J', units: 'in', pieces: [{ piece: 'A', joint: 'cutback', pipe: '6 std', angle: '60' }] })).toThrow(/pieces\[0\]\.angle/);
  });
});

describe('parseCsv', () => {
  it('reads RFC 4180 quoting, doubled quotes and CRLF (RFC 4180 section 2)', () => {
    expect(parseCsv('Station,Girth\r\n1,"1\'-2 3/4"""\r\n2,\r\n')).toEqual([['Station', 'Girth'], ['1', '1\'-2 3/4"'], ['2', '']]);
  });
});
