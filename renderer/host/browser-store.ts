// Browser-mode storage: picked input files are kept in IndexedDB (lanes files can be megabytes,
// beyond what localStorage holds) and the workspace document in localStorage under one key.

const DB_NAME = 'lanewright';
const STORE = 'files';

function openDb(): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const request = indexedDB.open(DB_NAME, 1);
    request.onupgradeneeded = () => request.result.createObjectStore(STORE);
    request.onsuccess = () => resolve(request.result);
    request.onerror = () => reject(request.error);
  });
}

async function run<T>(mode: IDBTransactionMode, action: (store: IDBObjectStore) => IDBRequest<T>): Promise<T> {
  const db = await openDb();
  try {
    return await new Promise<T>((resolve, reject) => {
      const request = action(db.transaction(STORE, mode).objectStore(STORE));
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error);
    });
  } finally {
    db.close();
  }
}

/** Stores the text of a picked file under its name. */
export function storeFileText(name: string, text: string): Promise<IDBValidKey> {
  return run('readwrite', (store) => store.put(text, name));
}

/** Text stored under `name`, or undefined. */
export function loadFileText(name: string): Promise<string | undefined> {
  return run('readonly', (store) => store.get(name) as IDBRequest<string | undefined>);
}

export const WORKSPACE_KEY = 'lanewright.workspace';
export const WORKSPACE_SAVED_AT_KEY = 'lanewright.workspace.openedAt';
