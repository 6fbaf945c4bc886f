// Every property name a plain object inherits, for tests that feed them in as user text: a lookup
// table that is a plain object finds these where it should find nothing.

export const PROTOTYPE_NAMES: readonly string[] = [...new Set([...Object.getOwnPropertyNames(Object.prototype), '__proto__', 'prototype'])];
