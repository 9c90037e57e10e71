/**
 * Excel.RangeAreas (ExcelApi 1.9), as Workbook.getSelectedRanges returns it, with its areas as a
 * RangeCollection. Members follow "Work with multiple ranges simultaneously in Excel add-ins":
 * `address` is the areas' addresses, each with its sheet, joined by ", " as that page's example
 * shows ("Sheet1!F3:F5, Sheet1!H:H"), and isEntireColumn is true only when every area is.
 */
import { formatRange, isWholeColumns } from '../../addressing/a1';
import { ShimClientObject, type Loadable } from './clientObject';
import { splitCollectionLoad } from './collectionLoad';
import type { LoadSpec } from './loadOptions';
import { invalidArgument, propertyNotLoaded } from './officeErrors';
import { ShimRange, type RangeTarget } from './range';
import { rangeRefOf } from './rangeRef';
import type { ShimRequestContext } from './requestContext';
import { ShimWorksheet } from './worksheet';

const RANGE_AREAS_SCALARS = ['address', 'addressLocal', 'areaCount', 'cellCount', 'isEntireColumn'] as const;

export class ShimRangeAreas extends ShimClientObject<RangeTarget[]> {
  protected readonly typeName = 'RangeAreas';
  protected readonly scalarNames: readonly string[] = RANGE_AREAS_SCALARS;
  private areasProxy: ShimRangeCollection | undefined;
  private worksheetProxy: ShimWorksheet | undefined;

  constructor(
    context: ShimRequestContext,
    private readonly locator: () => RangeTarget[],
    location: string,
  ) {
    super(context);
    this.queueResolve(location);
  }

  protected locate(): RangeTarget[] {
    return this.locator();
  }

  protected override navigation(name: string): Loadable | undefined {
    if (name === 'areas') return this.areas;
    if (name === 'worksheet') return this.worksheet;
    return undefined;
  }

  protected readScalar(name: string, targets: RangeTarget[]): unknown {
    const location = `RangeAreas.${name}`;
    const refs = targets.map((target) => rangeRefOf(this.context, target, location));
    switch (name) {
      case 'address':
      case 'addressLocal':
        return refs.map((ref) => formatRange(ref)).join(', ');
      case 'areaCount':
        return refs.length;
      case 'cellCount':
        return refs.reduce((sum, r) => sum + (r.bottom - r.top + 1) * (r.right - r.left + 1), 0);
      case 'isEntireColumn':
        return refs.every(isWholeColumns);
      default:
        throw invalidArgument(location);
    }
  }

  get address(): string {
    return this.loadedValue('address');
  }
  get addressLocal(): string {
    return this.loadedValue('addressLocal');
  }
  get areaCount(): number {
    return this.loadedValue('areaCount');
  }
  get cellCount(): number {
    return this.loadedValue('cellCount');
  }
  get isEntireColumn(): boolean {
    return this.loadedValue('isEntireColumn');
  }

  /** Like the real navigation property it needs no load itself; its items do. */
  get areas(): ShimRangeCollection {
    this.areasProxy ??= new ShimRangeCollection(this.context, () => this.target('RangeAreas.areas'));
    return this.areasProxy;
  }

  /** Every area of a selection is on the active sheet. */
  get worksheet(): ShimWorksheet {
    this.worksheetProxy ??= new ShimWorksheet(this.context, () => this.target('RangeAreas.worksheet')[0].sheet, 'RangeAreas.worksheet');
    return this.worksheetProxy;
  }
}

/** Excel.RangeCollection: `items` exist only once loaded ('areas', 'areas/items', 'areas/items/address'). */
export class ShimRangeCollection implements Loadable {
  private loadedItems: ShimRange[] | undefined;

  constructor(
    private readonly context: ShimRequestContext,
    private readonly targets: () => RangeTarget[],
  ) {}

  applyLoad(spec: LoadSpec): void {
    const { items } = splitCollectionLoad(spec, []);
    const ranges = this.targets().map((target) => new ShimRange(this.context, () => target, undefined));
    for (const range of ranges) range.applyLoad(items ?? { all: true });
    this.loadedItems = ranges;
  }

  get items(): ShimRange[] {
    if (!this.loadedItems) throw propertyNotLoaded('items', 'RangeCollection');
    return this.loadedItems;
  }
}
