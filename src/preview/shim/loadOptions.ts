/**
 * The three shapes `load()` accepts in the real API, reduced to one tree: 'values, address',
 * ['values', 'worksheet/name'], { values: true, worksheet: { name: true } } and the
 * { select, expand } form. A member loaded without a sub-path loads all of its scalars.
 */

export type LoadSpec = { all: true } | { all: false; members: Map<string, LoadSpec> };

export const LOAD_ALL: LoadSpec = { all: true };

function addPath(spec: { all: false; members: Map<string, LoadSpec> }, path: string): void {
  const parts = path.split('/').map((part) => part.trim());
  if (parts.some((part) => part === '')) return;
  let node: LoadSpec = spec;
  for (let i = 0; i < parts.length; i++) {
    if (node.all) return;
    const last = i === parts.length - 1;
    const existing: LoadSpec | undefined = node.members.get(parts[i]);
    if (last) {
      node.members.set(parts[i], LOAD_ALL);
      return;
    }
    if (existing) {
      node = existing;
    } else {
      const child: LoadSpec = { all: false, members: new Map() };
      node.members.set(parts[i], child);
      node = child;
    }
  }
}

function pathsOf(value: unknown): string[] {
  if (typeof value === 'string') return value.split(',');
  if (Array.isArray(value)) return value.flatMap((item) => (typeof item === 'string' ? item.split(',') : []));
  return [];
}

function addObject(spec: { all: false; members: Map<string, LoadSpec> }, option: Record<string, unknown>, prefix: string): void {
  if ('select' in option || 'expand' in option) {
    for (const path of [...pathsOf(option.select), ...pathsOf(option.expand)]) addPath(spec, prefix + path);
    return;
  }
  for (const [key, value] of Object.entries(option)) {
    // $top and $skip page a collection; every collection here is small enough to load whole.
    if (key.startsWith('$')) continue;
    if (value === true) addPath(spec, prefix + key);
    else if (typeof value === 'object' && value !== null) addObject(spec, value as Record<string, unknown>, `${prefix}${key}/`);
  }
}

export function parseLoadOption(option: unknown): LoadSpec {
  if (option === undefined || option === null) return LOAD_ALL;
  const spec: { all: false; members: Map<string, LoadSpec> } = { all: false, members: new Map() };
  if (typeof option === 'string' || Array.isArray(option)) {
    for (const path of pathsOf(option)) addPath(spec, path);
  } else if (typeof option === 'object') {
    addObject(spec, option as Record<string, unknown>, '');
  }
  return spec;
}
