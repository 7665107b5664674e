import { openDB, type IDBPDatabase } from 'idb';
import type { DocumentStore } from './document-store';

const DB_NAME = 'sigma-ledger';
const STORE = 'autosave';
const KEY = 'current';

type Snapshot = ReturnType<DocumentStore['snapshot']>;

/**
 * Keeps the open document and its undo history in IndexedDB (through idb),
 * written after every change, so a reload or a crashed tab loses nothing.
 */
export class Autosave {
  private db?: Promise<IDBPDatabase>;
  private pending = Promise.resolve();

  constructor(private readonly dbName = DB_NAME) {}

  private open(): Promise<IDBPDatabase> {
    this.db ??= openDB(this.dbName, 1, { upgrade: (db) => db.createObjectStore(STORE) });
    return this.db;
  }

  /** The last saved snapshot, or undefined when there is none (or storage is unavailable). */
  async load(): Promise<Snapshot | undefined> {
    try {
      return (await (await this.open()).get(STORE, KEY)) as Snapshot | undefined;
    } catch {
      return undefined;
    }
  }

  /** Saves a snapshot; writes are serialised so the last one wins. */
  save(snapshot: Snapshot): Promise<void> {
    this.pending = this.pending.then(async () => {
      await (await this.open()).put(STORE, snapshot, KEY);
    }).catch(() => undefined);
    return this.pending;
  }

  /** Forgets the saved work (after the user starts over). */
  async clear(): Promise<void> {
    await (await this.open()).delete(STORE, KEY);
  }

  /** Saves the store's snapshot after every change. */
  attach(store: DocumentStore): void {
    store.addEventListener('change', () => void this.save(store.snapshot()));
  }
}
