import type { LoadSpec } from './loadOptions';

/**
 * A collection's load split into its own scalars and what to load on each item: 'items' or
 * 'items/x' name the items, and (as in Office.js) a bare member name that is not the
 * collection's own means that member of each item; a plain load() loads both.
 */
export function splitCollectionLoad(spec: LoadSpec, ownScalars: readonly string[]): { scalars: string[]; items: LoadSpec | undefined } {
  if (spec.all) return { scalars: [...ownScalars], items: { all: true } };
  const scalars = [...spec.members.keys()].filter((name) => ownScalars.includes(name));
  const members = new Map([...spec.members].filter(([name]) => !ownScalars.includes(name) && name !== 'items'));
  const named = spec.members.get('items');
  if (named?.all) return { scalars, items: { all: true } };
  if (named === undefined && members.size === 0) return { scalars, items: scalars.length === 0 ? { all: true } : undefined };
  return { scalars, items: { all: false, members: new Map([...(named?.members ?? []), ...members]) } };
}
