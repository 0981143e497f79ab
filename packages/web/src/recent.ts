/**
 * Recent jobs on this device (the browser's localStorage): each a name and
 * the form's link, newest first, at most {@link MAX_RECENT}.
 */

/** How many recent jobs are kept. */
export const MAX_RECENT = 12;

/** The localStorage key. */
export const RECENT_KEY = 'girth.recent.v1';

/** One remembered job. */
export interface RecentJob {
  /** Words for the list: the piece or joint and its pipes. */
  readonly name: string;
  /** The form as a URL fragment (see state-url.ts). */
  readonly hash: string;
}

/** The storage the list lives in (localStorage, or a stand-in in tests). */
export interface RecentStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

/**
 * The remembered jobs, newest first; an unreadable entry reads as none.
 * @example readRecent(localStorage)[0]?.name
 */
export function readRecent(store: RecentStore): readonly RecentJob[] {
  try {
    const data: unknown = JSON.parse(store.getItem(RECENT_KEY) ?? '[]');
    if (!Array.isArray(data)) return [];
    return data.filter((r): r is RecentJob => typeof r?.name === 'string' && typeof r?.hash === 'string').slice(0, MAX_RECENT);
  } catch {
    return [];
  }
}

/**
 * Puts a job first in the list (once: the same form moves up) and keeps at most
 * {@link MAX_RECENT}. A full or blocked storage is ignored: remembering is a help, not a need.
 * @example rememberJob(localStorage, { name: 'NPS 8 on NPS 12', hash })
 */
export function rememberJob(store: RecentStore, job: RecentJob): readonly RecentJob[] {
  const list = [job, ...readRecent(store).filter((r) => r.hash !== job.hash)].slice(0, MAX_RECENT);
  try {
    store.setItem(RECENT_KEY, JSON.stringify(list));
  } catch {
    // storage full or blocked: the list is still returned for this visit
  }
  return list;
}
