/**
 * Members of the real API the preview leaves out. Assigning to a missing property of a proxy
 * would silently create a plain field and change nothing, so these fail loudly instead.
 */
import { notInPreview } from './officeErrors';

export function refuseMembers(prototype: object, typeName: string, names: readonly string[]): void {
  for (const name of names) {
    const refuse = (): never => {
      throw notInPreview(`${typeName}.${name}`);
    };
    Object.defineProperty(prototype, name, { get: refuse, set: refuse, configurable: true });
  }
}
