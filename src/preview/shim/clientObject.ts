/**
 * What every proxy shares: a target resolved at sync time, properties that exist only once
 * loaded and synced, and writes that are remembered locally at once and applied at sync.
 */
import { parseLoadOption, type LoadSpec } from './loadOptions';
import { itemNotFound, notInPreview, propertyNotLoaded } from './officeErrors';
import type { ShimRequestContext } from './requestContext';

/** Anything `load()` can reach through a navigation property such as 'worksheet/name'. */
export interface Loadable {
  applyLoad(spec: LoadSpec): void;
}

export abstract class ShimClientObject<Target> implements Loadable {
  protected abstract readonly typeName: string;
  protected abstract readonly scalarNames: readonly string[];
  private readonly loadedValues = new Map<string, unknown>();
  private resolved: { target: Target | null } | undefined;

  constructor(readonly context: ShimRequestContext) {}

  /** Finds the target in the model; null only for *OrNullObject look-ups. Throws Office errors. */
  protected abstract locate(): Target | null;
  protected abstract readScalar(name: string, target: Target): unknown;

  protected navigation(_name: string): Loadable | undefined {
    return undefined;
  }

  /** The real API instantiates an object at its place in the batch; a bad path fails there. */
  protected queueResolve(location: string): void {
    this.context.enqueue(location, () => {
      this.resolveOrNull();
    });
  }

  resolveOrNull(): Target | null {
    if (!this.resolved) this.resolved = { target: this.locate() };
    return this.resolved.target;
  }

  /** The target for a write or a derived object; a null object has none to offer. */
  target(location: string): Target {
    const target = this.resolveOrNull();
    if (target === null) throw itemNotFound(location);
    return target;
  }

  get isNullObject(): boolean {
    if (!this.resolved) throw propertyNotLoaded('isNullObject', this.typeName);
    return this.resolved.target === null;
  }

  load(option?: unknown): this {
    const spec = parseLoadOption(option);
    this.context.enqueue(`${this.typeName}.load`, () => this.applyLoad(spec));
    return this;
  }

  applyLoad(spec: LoadSpec): void {
    const target = this.resolveOrNull();
    // The real API loads nothing for a null object and does not complain about it.
    if (target === null) return;
    const names = spec.all ? this.scalarNames : [...spec.members.keys()];
    for (const name of names) {
      if (this.scalarNames.includes(name)) {
        const value = this.readScalar(name, target);
        this.context.countResponse(value, `${this.typeName}.${name}`);
        this.loadedValues.set(name, value);
        continue;
      }
      const child = this.navigation(name);
      if (!child) throw notInPreview(`${this.typeName}.${name}`);
      child.applyLoad(spec.all ? { all: true } : (spec.members.get(name) ?? { all: true }));
    }
  }

  protected loadedValue<T>(name: string): T {
    if (this.loadedValues.has(name)) return this.loadedValues.get(name) as T;
    // Office.js skips the not-loaded check on null objects: their properties read as undefined.
    if (this.resolved && this.resolved.target === null) return undefined as T;
    throw propertyNotLoaded(name, this.typeName);
  }

  /** Office.js keeps a value the add-in sets, so it reads back at once and after the sync. */
  protected queueWrite(name: string, value: unknown, apply: (target: Target, location: string) => void): void {
    this.loadedValues.set(name, value);
    const location = `${this.typeName}.${name}`;
    this.context.enqueue(location, () => apply(this.target(location), location), value);
  }
}
