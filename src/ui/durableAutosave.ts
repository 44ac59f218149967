/**
 * A second copy of the autosave in IndexedDB, committed with `durability: 'strict'` (the browser
 * flushes it to disk before reporting the transaction complete; IndexedDB 3.0, transaction
 * durability). localStorage is written at once but may reach the disk only later, so a browser killed
 * right after an edit can lose it there; at start-up the page takes whichever copy is newer (by the
 * autosave's revision). Every failure here is silent by design: localStorage stays the primary copy.
 */
const DB_NAME = 'coversweep';
const STORE = 'autosave';
const RECORD = 'latest';

export interface DurableCopy {
  rev: number;
  tab: string;
  text: string;
}

function openDb(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const req = indexedDB.open(DB_NAME, 1);
    req.onupgradeneeded = () => req.result.createObjectStore(STORE);
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
    req.onblocked = () => reject(new Error('blocked'));
  });
}

let db: Promise<IDBDatabase> | null = null;
function database(): Promise<IDBDatabase> {
  db ??= openDb();
  return db;
}

/** Read the durable copy; null when there is none or it cannot be read within `timeoutMs`. */
export async function readDurable(timeoutMs = 1000): Promise<DurableCopy | null> {
  if (typeof indexedDB === 'undefined') return null;
  const read = database().then(
    (d) =>
      new Promise<DurableCopy | null>((resolve) => {
        const get = d.transaction(STORE, 'readonly').objectStore(STORE).get(RECORD);
        get.onsuccess = () => {
          const v = get.result as Partial<DurableCopy> | undefined;
          resolve(
            v && typeof v.rev === 'number' && typeof v.text === 'string' && typeof v.tab === 'string'
              ? { rev: v.rev, tab: v.tab, text: v.text }
              : null,
          );
        };
        get.onerror = () => resolve(null);
      }),
  );
  const timeout = new Promise<null>((resolve) => setTimeout(() => resolve(null), timeoutMs));
  return Promise.race([read.catch(() => null), timeout]);
}

/** Write the durable copy (fire and forget; a newer write simply follows). */
export function writeDurable(copy: DurableCopy): void {
  if (typeof indexedDB === 'undefined') return;
  database()
    .then((d) => {
      const tx = d.transaction(STORE, 'readwrite', { durability: 'strict' });
      tx.objectStore(STORE).put(copy, RECORD);
    })
    .catch(() => undefined);
}
