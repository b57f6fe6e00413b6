/**
 * Cache of site histories (spin-up, calibration and the 1850–2014 transient) keyed by the profile
 * hash: in memory (least recently used, bounded) and optionally in a directory as JSON files
 * (`<hash>.json`), so a later process can reuse them. Entries are plain serialisable data.
 *
 * API: `new HistoryCache({ maxEntries?, directory? })`, `get(hash)`, `set(hash, value)`, `clear()`;
 * `defaultHistoryCache` (memory only, shared by the process).
 */
import fs from 'node:fs';
import path from 'node:path';
import type { SiteHistory } from './site-model';

export interface HistoryCacheOptions {
  /** Largest number of entries kept in memory (default 32). */
  maxEntries?: number;
  /** Directory of the optional file cache (created if missing). */
  directory?: string;
}

export class HistoryCache {
  private readonly map = new Map<string, SiteHistory>();
  private readonly maxEntries: number;
  readonly directory: string | undefined;

  constructor(options: HistoryCacheOptions = {}) {
    this.maxEntries = options.maxEntries ?? 32;
    this.directory = options.directory;
  }

  private file(hash: string): string | null {
    if (!this.directory || !/^[0-9a-f]{64}$/.test(hash)) return null;
    return path.join(this.directory, `${hash}.json`);
  }

  /** The cached history, from memory, else from the directory (then kept in memory), else undefined. */
  get(hash: string): SiteHistory | undefined {
    const hit = this.map.get(hash);
    if (hit) {
      this.map.delete(hash);
      this.map.set(hash, hit);
      return hit;
    }
    const f = this.file(hash);
    if (f && fs.existsSync(f)) {
      try {
        const value = JSON.parse(fs.readFileSync(f, 'utf8')) as SiteHistory;
        this.remember(hash, value);
        return value;
      } catch {
        // A damaged cache file is ignored (and overwritten by the next set).
      }
    }
    return undefined;
  }

  /** Stores a history in memory and, if configured, in the directory (written atomically). */
  set(hash: string, value: SiteHistory): void {
    this.remember(hash, value);
    const f = this.file(hash);
    if (f) {
      fs.mkdirSync(this.directory!, { recursive: true });
      const tmp = `${f}.${process.pid}.tmp`;
      fs.writeFileSync(tmp, JSON.stringify(value));
      fs.renameSync(tmp, f);
    }
  }

  /** Empties the memory cache (the directory is left alone). */
  clear(): void {
    this.map.clear();
  }

  private remember(hash: string, value: SiteHistory): void {
    this.map.delete(hash);
    this.map.set(hash, value);
    while (this.map.size > this.maxEntries) {
      const oldest = this.map.keys().next().value as string;
      this.map.delete(oldest);
    }
  }
}

/** The process-wide memory cache used when no cache is passed. */
export const defaultHistoryCache = new HistoryCache();
