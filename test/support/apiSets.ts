// Which Office requirement sets the add-in's own code needs: every Office.js or CustomFunctions
// member that the code Excel loads (the pane and the cell functions, not the preview host) refers
// to, resolved by the TypeScript checker to its declaration in @types/office-js or
// @types/custom-functions-runtime, whose JSDoc carries the API reference's "[Api set: NAME n.n]"
// remark. The manifest test compares the result with the sets manifest.xml declares.
import { join, sep } from 'node:path';
import ts from 'typescript';

export interface SetUse {
  /** The highest version of the set that a used member needs. */
  version: string;
  /** The members that need exactly that version, as written in the code, e.g. "getSelectedRanges". */
  members: string[];
}

const API_SET = /\[\s*Api set:\s*([A-Za-z]+)\s+(\d+\.\d+)\s*\]/i;
const OFFICE_TYPINGS = /[\\/]@types[\\/](office-js|custom-functions-runtime)[\\/]/;

export function compareVersions(a: string, b: string): number {
  const [aMajor, aMinor] = a.split('.').map(Number);
  const [bMajor, bMinor] = b.split('.').map(Number);
  return aMajor - bMajor || aMinor - bMinor;
}

function apiSetOf(declaration: ts.Node): { name: string; version: string } | undefined {
  if (!OFFICE_TYPINGS.test(declaration.getSourceFile().fileName)) return undefined;
  for (const doc of ts.getJSDocCommentsAndTags(declaration)) {
    const match = API_SET.exec(doc.getText());
    if (match) return { name: match[1], version: match[2] };
  }
  return undefined;
}

/** The declarations a reference really uses: the chosen overload for a call, else every declaration. */
function declarationsOf(checker: ts.TypeChecker, name: ts.Identifier): readonly ts.Node[] {
  const access = name.parent;
  const call = access.parent;
  if (ts.isCallExpression(call) && call.expression === access) {
    const declaration = checker.getResolvedSignature(call)?.declaration;
    if (declaration) return [declaration];
  }
  let symbol = checker.getSymbolAtLocation(name);
  if (symbol && symbol.flags & ts.SymbolFlags.Alias) symbol = checker.getAliasedSymbol(symbol);
  return symbol?.declarations ?? [];
}

/**
 * For every requirement set the code uses, its highest needed version. A member declared in several
 * places (overloads reached without a call, merged declarations) counts with its lowest version.
 */
export function requirementSetsUsed(root: string, entryPoints: readonly string[], excludedDirs: readonly string[]): Map<string, SetUse> {
  const configPath = join(root, 'tsconfig.json');
  const config = ts.readConfigFile(configPath, (p) => ts.sys.readFile(p));
  const parsed = ts.parseJsonConfigFileContent(config.config, ts.sys, root);
  const program = ts.createProgram(
    entryPoints.map((e) => join(root, e)),
    parsed.options,
  );
  const checker = program.getTypeChecker();
  const ownSource = join(root, 'src') + sep;
  const excluded = excludedDirs.map((d) => join(root, d) + sep);
  const used = new Map<string, SetUse>();

  const record = (setName: string, version: string, member: string) => {
    const current = used.get(setName);
    const order = current ? compareVersions(version, current.version) : 1;
    if (!current || order > 0) used.set(setName, { version, members: [member] });
    else if (order === 0 && !current.members.includes(member)) current.members.push(member);
  };

  for (const file of program.getSourceFiles()) {
    const path = file.fileName.split('/').join(sep);
    if (file.isDeclarationFile || !path.startsWith(ownSource) || excluded.some((d) => path.startsWith(d))) continue;
    const visit = (node: ts.Node): void => {
      if (ts.isPropertyAccessExpression(node) && ts.isIdentifier(node.name)) {
        const sets = declarationsOf(checker, node.name)
          .map(apiSetOf)
          .filter((s): s is { name: string; version: string } => s !== undefined);
        const lowest = new Map<string, string>();
        for (const s of sets) {
          const seen = lowest.get(s.name);
          if (!seen || compareVersions(s.version, seen) < 0) lowest.set(s.name, s.version);
        }
        for (const [setName, version] of lowest) record(setName, version, node.name.text);
      }
      // An enum indexed by a computed key (CustomFunctions.ErrorCode[name]) may reach any member.
      if (ts.isElementAccessExpression(node) && !ts.isStringLiteralLike(node.argumentExpression)) {
        const target = ts.isPropertyAccessExpression(node.expression) ? node.expression.name : node.expression;
        const symbol = checker.getSymbolAtLocation(target);
        if (symbol && symbol.flags & ts.SymbolFlags.Enum) {
          for (const member of checker.getExportsOfModule(symbol)) {
            for (const set of (member.declarations ?? []).map(apiSetOf)) {
              if (set) record(set.name, set.version, `${symbol.name}[…]`);
            }
          }
        }
      }
      ts.forEachChild(node, visit);
    };
    visit(file);
  }
  return used;
}
