import { formatCount } from '../../presentation';
/** The progress of a block read, with the way out. */
export function ReadProgress({ read, total, onCancel }: { read: number; total: number; onCancel(): void }) {
  const text = `Read ${formatCount(read)} of ${formatCount(total)} rows`;
  return (
    <div class="progress" role="status">
      <progress value={read} max={total} aria-label="Rows read" />
      <span>{text}</span>
      <button type="button" onClick={onCancel}>
        Cancel
      </button>
    </div>
  );
}
