import type { PreviewWorkbook } from '../workbook/workbook';

/**
 * Switches for host behaviour a person (or a browser test) may want to try: a cell being edited,
 * during which add-in batches fail unless they asked to wait, and the older desktop builds that
 * pass blank cells to custom functions as 0.
 */
export function HostSwitches({ workbook }: { workbook: PreviewWorkbook }) {
  return (
    <div class="host-switches">
      <label>
        <input type="checkbox" checked={workbook.cellEditMode()} onChange={(e) => workbook.setCellEditMode((e.currentTarget as HTMLInputElement).checked)} />{' '}
        Editing a cell (batches fail unless they wait for the edit)
      </label>
      <label>
        <input
          type="checkbox"
          checked={workbook.calculationBehaviour().blankCellsAs === 0}
          onChange={(e) => workbook.setCalculationBehaviour({ blankCellsAs: (e.currentTarget as HTMLInputElement).checked ? 0 : null })}
        />{' '}
        Blank cells reach functions as 0 (older Excel desktop)
      </label>
    </div>
  );
}
