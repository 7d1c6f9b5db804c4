// The registry of families: one entry per family, looked up by the language at load time.

import type { Family } from './family.js';

const families = new Map<string, Family<any, any>>();

export function defineFamily<P, T extends import('../values/structured.js').Structured>(f: Family<P, T>): Family<P, T> {
  if (families.has(f.name)) throw new Error(`family ${f.name} registered twice`);
  families.set(f.name, f);
  return f;
}

export function getFamily(name: string): Family<any, any> | undefined {
  return families.get(name);
}

export function allFamilies(): Family<any, any>[] {
  return [...families.values()].sort((a, b) => a.name.localeCompare(b.name));
}
