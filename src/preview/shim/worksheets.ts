/** Excel.WorksheetCollection over the model's sheet list. */
import { ShimClientObject } from './clientObject';
import type { LoadSpec } from './loadOptions';
import { invalidArgument, itemAlreadyExists, itemNotFound } from './officeErrors';
import type { SheetHandle, ShimRequestContext } from './requestContext';
import { isValidSheetName } from './sheetNames';
import { ShimWorksheet } from './worksheet';

export class ShimWorksheetCollection extends ShimClientObject<true> {
  protected readonly typeName = 'WorksheetCollection';
  protected readonly scalarNames: readonly string[] = [];
  private loadedItems: ShimWorksheet[] | undefined;

  constructor(context: ShimRequestContext) {
    super(context);
    this.resolveOrNull();
  }

  protected locate(): true {
    return true;
  }

  protected readScalar(name: string): unknown {
    throw invalidArgument(`WorksheetCollection.${name}`);
  }

  /**
   * 'items' loads every scalar of each sheet, 'items/name' just the name; as in Office.js a
   * bare member name ('name') on a collection means that member of each item.
   */
  override applyLoad(spec: LoadSpec): void {
    let itemSpec: LoadSpec;
    if (spec.all) {
      itemSpec = spec;
    } else {
      const members = new Map(spec.members);
      const items = members.get('items');
      members.delete('items');
      itemSpec =
        items?.all || (items === undefined && members.size === 0) ? { all: true } : { all: false, members: new Map([...(items?.members ?? []), ...members]) };
    }
    const sheets = this.context.model.sheetNames().map((name) => new ShimWorksheet(this.context, () => this.context.handleFor(name), undefined));
    for (const sheet of sheets) sheet.applyLoad(itemSpec);
    this.loadedItems = sheets;
  }

  get items(): ShimWorksheet[] {
    if (!this.loadedItems) return this.loadedValue('items');
    return this.loadedItems;
  }

  getItem(key: string): ShimWorksheet {
    const location = 'WorksheetCollection.getItem';
    return new ShimWorksheet(this.context, () => this.context.findSheet(String(key)) ?? throwError(itemNotFound(location)), location);
  }

  getItemOrNullObject(key: string): ShimWorksheet {
    return new ShimWorksheet(this.context, () => this.context.findSheet(String(key)) ?? null, 'WorksheetCollection.getItemOrNullObject');
  }

  getActiveWorksheet(): ShimWorksheet {
    const location = 'WorksheetCollection.getActiveWorksheet';
    return new ShimWorksheet(this.context, () => this.context.findSheet(this.context.model.activeSheet()) ?? throwError(itemNotFound(location)), location);
  }

  /**
   * The sheet is added when the batch reaches this call; without a name it takes the first free
   * "SheetN" counting on from the number of sheets, so a one-sheet workbook gets Sheet2, Sheet3….
   */
  add(name?: string): ShimWorksheet {
    const location = 'WorksheetCollection.add';
    return new ShimWorksheet(this.context, () => this.addSheet(name, location), location);
  }

  private addSheet(name: string | undefined, location: string): SheetHandle {
    const model = this.context.model;
    let sheetName: string;
    if (name === undefined || name === null) {
      let n = model.sheetNames().length + 1;
      while (this.context.findSheet(`Sheet${n}`)) n++;
      sheetName = `Sheet${n}`;
    } else {
      if (typeof name !== 'string' || !isValidSheetName(name)) throw invalidArgument(location);
      if (this.context.findSheet(name)) throw itemAlreadyExists(location);
      sheetName = name;
    }
    model.addSheet(sheetName);
    return this.context.handleFor(sheetName);
  }
}

function throwError(error: Error): never {
  throw error;
}
