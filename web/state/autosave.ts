import { openDB, type IDBPDatabase } from 'idb';
import type { DocumentStore } from './document-store';
import { chainOf, snapshotOf, type Chain, type Snapshot } from './history-chain';
import { isValidBudget, looksLikeBudget } from './restore-check';

const DB_NAME = 'sigma-ledger';
/** Version 1 kept one record with the whole history; version 2 keeps one record per document version. */
const DB_VERSION = 2;
const LEGACY_STORE = 'autosave';
const VERSIONS = 'versions';
const HEAD = 'head';
const KEY = 'current';

/** The index of the saved history: which versions, in order, and which one is shown. */
interface Head {
  fileName: string;
  ids: number[];
  labels: string[];
  position: number;
}

/** One saved document version. */
interface VersionRecord {
  id: number;
  document: unknown;
}

/** Why a write failed, in words the page shows. */
function failureText(e: unknown): string {
  const name = (e as { name?: string } | null)?.name;
  if (name === 'QuotaExceededError') return "the browser's storage for this page is full";
  if (name === 'SecurityError' || name === 'InvalidStateError') return 'the browser does not allow this page to store data (private window or blocked storage)';
  return `the browser refused to store it (${name ?? String(e)})`;
}

/**
 * Keeps the open document and its undo history in IndexedDB (through idb),
 * written after every change, so a reload or a crashed tab loses nothing.
 *
 * Each document version is stored once under its own key and an edit
 * writes only the new version and a small index, in one transaction, so a
 * save costs the same at any history length. A failed write (storage full,
 * IndexedDB blocked) sets {@link failure} and fires `status`, and the page
 * warns until a later write succeeds. On load the shown version is
 * validated; a damaged one falls back to the last good version and
 * {@link restoreNote} says so.
 */
export class Autosave extends EventTarget {
  /** Why the latest save failed, or undefined when it succeeded. */
  failure?: string;
  /** What load had to repair, for the page to say (undefined when nothing). */
  restoreNote?: string;

  private db?: Promise<IDBPDatabase>;
  private pending = Promise.resolve();
  /** Key of each document version already stored, by object identity. */
  private ids = new WeakMap<object, number>();
  private stored = new Set<number>();
  private nextId = 1;

  constructor(private readonly dbName = DB_NAME) {
    super();
  }

  private open(): Promise<IDBPDatabase> {
    this.db ??= (async () => {
      if (typeof indexedDB === 'undefined') throw Object.assign(new Error('no IndexedDB'), { name: 'SecurityError' });
      return openDB(this.dbName, DB_VERSION, {
        upgrade: (db) => {
          if (!db.objectStoreNames.contains(LEGACY_STORE)) db.createObjectStore(LEGACY_STORE);
          if (!db.objectStoreNames.contains(VERSIONS)) db.createObjectStore(VERSIONS, { keyPath: 'id' });
          if (!db.objectStoreNames.contains(HEAD)) db.createObjectStore(HEAD);
        },
        blocked: () => this.fail(Object.assign(new Error('blocked'), { name: 'blocked by another tab' })),
      });
    })();
    this.db.catch(() => (this.db = undefined));
    return this.db;
  }

  /** The last saved snapshot, or undefined when there is none (or storage is unavailable: then {@link failure} says why). */
  async load(): Promise<Snapshot | undefined> {
    this.restoreNote = undefined;
    try {
      const db = await this.open();
      const head = (await db.get(HEAD, KEY)) as Head | undefined;
      if (head) return this.fromHead(db, head);
      const legacy = (await db.get(LEGACY_STORE, KEY)) as Snapshot | undefined;
      if (legacy && isValidBudget(legacy.document)) return legacy;
      if (legacy) this.restoreNote = 'The autosaved budget could not be read, so the example is shown; nothing else was changed.';
      return undefined;
    } catch (e) {
      this.fail(e);
      return undefined;
    }
  }

  /** Saves a snapshot: new document versions and the index in one transaction; writes are serialised so the last one wins. */
  save(snapshot: Snapshot): Promise<void> {
    this.pending = this.pending.then(() => this.write(chainOf(snapshot), snapshot.fileName)).catch((e) => this.fail(e));
    return this.pending;
  }

  /** Forgets the saved work (after the user starts over). */
  async clear(): Promise<void> {
    const db = await this.open();
    const tx = db.transaction([VERSIONS, HEAD, LEGACY_STORE], 'readwrite');
    await Promise.all([tx.objectStore(VERSIONS).clear(), tx.objectStore(HEAD).clear(), tx.objectStore(LEGACY_STORE).clear(), tx.done]);
    this.ids = new WeakMap();
    this.stored.clear();
  }

  /** Saves the store's snapshot after every change. */
  attach(store: DocumentStore): void {
    store.addEventListener('change', () => void this.save(store.snapshot()));
  }

  private async write(chain: Chain, fileName: string): Promise<void> {
    const db = await this.open();
    const fresh = new Map<object, number>();
    const ids = chain.documents.map((d) => this.ids.get(d) ?? fresh.get(d) ?? (fresh.set(d, this.nextId++), fresh.get(d)!));
    const keep = new Set(ids);
    const tx = db.transaction([VERSIONS, HEAD], 'readwrite');
    const versions = tx.objectStore(VERSIONS);
    const writes: Promise<unknown>[] = [];
    for (const [doc, id] of fresh) writes.push(versions.put({ id, document: doc } satisfies VersionRecord));
    for (const id of this.stored) if (!keep.has(id)) writes.push(versions.delete(id));
    writes.push(tx.objectStore(HEAD).put({ fileName, ids, labels: chain.labels, position: chain.position } satisfies Head, KEY));
    await Promise.all([...writes, tx.done]);
    for (const [doc, id] of fresh) this.ids.set(doc, id);
    this.stored = keep;
    if (this.failure !== undefined) {
      this.failure = undefined;
      this.dispatchEvent(new Event('status'));
    }
  }

  /** The chain the head describes, cut to the versions that pass their checks. */
  private async fromHead(db: IDBPDatabase, head: Head): Promise<Snapshot | undefined> {
    const ids = Array.isArray(head.ids) ? head.ids.filter((id) => typeof id === 'number') : [];
    const records = (await Promise.all(ids.map((id) => db.get(VERSIONS, id)))) as (VersionRecord | undefined)[];
    const docs = records.map((r) => r?.document);
    const wanted = Number.isInteger(head.position) ? Math.min(Math.max(0, head.position), docs.length - 1) : docs.length - 1;
    let shown = wanted;
    while (shown >= 0 && !isValidBudget(docs[shown])) shown--;
    if (shown < 0) {
      this.restoreNote = 'The autosaved budget was damaged and no earlier version could be read, so the example is shown.';
      return undefined;
    }
    // The history around the shown version: back to the first damaged version before it, forward (redo) to the first after.
    let first = shown;
    while (first > 0 && looksLikeBudget(docs[first - 1])) first--;
    let last = shown;
    while (shown === wanted && last + 1 < docs.length && looksLikeBudget(docs[last + 1])) last++;
    const labels = Array.isArray(head.labels) ? head.labels : [];
    if (shown < wanted) {
      const label = labels[shown] ? ` (after "${labels[shown]}")` : '';
      this.restoreNote = `The autosaved budget was damaged; the last good version${label} is restored, ${wanted - shown} edit${wanted - shown === 1 ? '' : 's'} earlier than the one that was shown.`;
    }
    const chain: Chain = {
      documents: docs.slice(first, last + 1) as Chain['documents'],
      labels: ['', ...labels.slice(first + 1, last + 1).map((l) => (typeof l === 'string' ? l : 'edit'))],
      position: shown - first,
    };
    chain.documents.forEach((d, k) => this.ids.set(d, ids[first + k]));
    this.stored = new Set(ids);
    this.nextId = Math.max(0, ...ids) + 1;
    return snapshotOf(chain, typeof head.fileName === 'string' ? head.fileName : 'budget.json');
  }

  private fail(e: unknown): void {
    this.failure = failureText(e);
    this.dispatchEvent(new Event('status'));
  }
}
