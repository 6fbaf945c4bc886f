// Tables looked up by text from a file (header names, currency marks, column names, depot ids) must
// find only what was put in them. On a plain object "constructor" or "toString" finds a function of
// Object.prototype, and assigning to "__proto__" changes the prototype and drops the value.

/** A null-prototype copy of `entries`: looking up any text finds only these entries. */
export function lookupTable<V>(entries: Readonly<Record<string, V>>): Readonly<Record<string, V>> {
  return Object.assign(Object.create(null) as Record<string, V>, entries);
}

/** An empty null-prototype record to fill with keys taken from user text. */
export function textKeyedRecord<V>(): Record<string, V> {
  return Object.create(null) as Record<string, V>;
}

/** `table[key]` when `key` is the table's own entry, else undefined (safe for any record). */
export function ownEntry<V>(table: Readonly<Record<string, V>>, key: string): V | undefined {
  return Object.hasOwn(table, key) ? table[key] : undefined;
}
