/**
 * The preview host's switches for behaviour that depends on the host rather than the workbook:
 * how long a sync takes, the payload limit, and which error a batch gets during cell editing.
 * installOfficeShim returns the live object; changing a member takes effect at the next sync.
 */

/** "Resource limits and performance optimization for Office Add-ins": Excel on the web caps each request and response at 5 MB. */
export const PAYLOAD_LIMIT_BYTES = 5_000_000;

export interface ShimSettings {
  /**
   * A sync settles no sooner than a macrotask (setTimeout) after it is sent, plus this many
   * milliseconds, as a request to a real host does; 0 keeps tests quick.
   */
  syncDelayMs: number;
  /** Bytes; lower values may be set for tests, higher ones are capped at PAYLOAD_LIMIT_BYTES. */
  payloadLimitBytes: number;
  /**
   * "Delay execution while cell is being edited" names InvalidOperation; the error-code table
   * of "Error handling with the application-specific JavaScript APIs" also lists
   * InvalidOperationInCellEditMode. The add-in must cope with either.
   */
  cellEditErrorCode: 'InvalidOperation' | 'InvalidOperationInCellEditMode';
}

export function defaultSettings(): ShimSettings {
  return { syncDelayMs: 0, payloadLimitBytes: PAYLOAD_LIMIT_BYTES, cellEditErrorCode: 'InvalidOperation' };
}

export function payloadLimit(settings: ShimSettings): number {
  return Math.min(settings.payloadLimitBytes, PAYLOAD_LIMIT_BYTES);
}

const encoder = new TextEncoder();

/**
 * What a value adds to a request or response: the UTF-8 length of its JSON text. The real
 * payload also carries the calls and objects, so this is a lower bound, never an overestimate
 * that would let too much through.
 */
export function payloadBytes(value: unknown): number {
  const text = JSON.stringify(value);
  return text === undefined ? 0 : encoder.encode(text).length;
}
