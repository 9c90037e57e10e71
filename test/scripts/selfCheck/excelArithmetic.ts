/**
 * Evaluates the self-check's own arithmetic (its LRE, Result and Summary formulas) the way Excel
 * does, so a test can show that the verdict Excel will display follows from the PLUMB results.
 * It knows only what those formulas use, each as the Excel function reference
 * (support.microsoft.com) describes it: IF evaluates only the branch it picks; ISNUMBER is FALSE
 * for an error; NOT, ABS, LOG10 (#NUM! for 0 or less), MIN, MAX, SUM (text in a range ignored);
 * COUNTIF counts cells equal to a text criterion, ignoring case; an empty cell reads as 0 in
 * arithmetic and a formula that refers to one yields 0; any other error propagates. Cells that hold PLUMB formulas take their values from
 * the caller (the preview).
 */
type Scalar = number | string | boolean | { error: string };
/** null is an empty cell, read directly. */
type Value = Scalar | null | (Scalar | null)[];

export interface ArithmeticSheets {
  /** A cell's formula (without "="), or undefined for a constant or an empty cell. */
  formulaAt(sheet: string, address: string): string | undefined;
  /** What a cell holds when it has no formula to evaluate here: a constant, or a PLUMB result. */
  valueAt(sheet: string, address: string): Scalar | null;
}

const TOKEN =
  /\s*(?:(?<string>"(?:[^"]|"")*")|(?<ref>(?:[A-Za-z_][A-Za-z0-9_.]*!)?\$?[A-Z]{1,3}\$?\d+(?::\$?[A-Z]{1,3}\$?\d+)?)(?![A-Za-z0-9_(])|(?<number>\d+(?:\.\d+)?(?:[eE][-+]?\d+)?)|(?<name>[A-Z][A-Z0-9.]*)(?=\()|(?<op>>=|<=|<>|[-+*/=<>(),]))/y;

function tokens(formula: string): string[] {
  const out: string[] = [];
  TOKEN.lastIndex = 0;
  while (TOKEN.lastIndex < formula.length) {
    const m = TOKEN.exec(formula);
    if (!m) throw new Error(`Cannot read "${formula.slice(TOKEN.lastIndex)}" as Excel formula text.`);
    out.push(m[0].trim());
  }
  return out;
}

const isError = (v: unknown): v is { error: string } => typeof v === 'object' && v !== null && !Array.isArray(v) && 'error' in v;

function addressesOf(range: string): string[] {
  const [from, to = from] = range.replace(/\$/g, '').split(':');
  const parse = (a: string) => {
    const m = /^([A-Z]+)(\d+)$/.exec(a)!;
    return { column: [...m[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0), row: Number(m[2]) };
  };
  const a = parse(from);
  const b = parse(to);
  const letters = (n: number): string => (n <= 0 ? '' : letters(Math.floor((n - 1) / 26)) + String.fromCharCode(65 + ((n - 1) % 26)));
  const out: string[] = [];
  for (let r = a.row; r <= b.row; r++) for (let c = a.column; c <= b.column; c++) out.push(`${letters(c)}${r}`);
  return out;
}

export class ExcelArithmetic {
  private readonly memo = new Map<string, Scalar>();

  constructor(private readonly sheets: ArithmeticSheets) {}

  /** The value Excel shows in one cell. */
  cell(sheet: string, address: string): Scalar | null {
    const key = `${sheet}!${address}`;
    const known = this.memo.get(key);
    if (known !== undefined) return known;
    const formula = this.sheets.formulaAt(sheet, address);
    if (formula === undefined) return this.sheets.valueAt(sheet, address);
    const value = new FormulaEvaluation(this, sheet, tokens(formula)).run();
    if (Array.isArray(value)) throw new Error(`${key} evaluates to a range.`);
    const shown = value ?? 0;
    this.memo.set(key, shown);
    return shown;
  }
}

class FormulaEvaluation {
  private at = 0;

  constructor(
    private readonly book: ExcelArithmetic,
    private readonly sheet: string,
    private readonly tokens: string[],
  ) {}

  run(): Value {
    const value = this.comparison();
    if (this.at !== this.tokens.length) throw new Error(`Unexpected "${this.tokens[this.at]}".`);
    return value;
  }

  private peek(): string | undefined {
    return this.tokens[this.at];
  }

  private take(expected?: string): string {
    const token = this.tokens[this.at++];
    if (token === undefined || (expected !== undefined && token !== expected)) throw new Error(`Expected ${expected ?? 'more'}, got ${token}.`);
    return token;
  }

  private comparison(): Value {
    const left = this.additive();
    const op = this.peek();
    if (op === undefined || !['=', '<>', '>=', '<=', '>', '<'].includes(op)) return left;
    this.take();
    const a = this.scalar(left) ?? 0;
    const b = this.scalar(this.additive()) ?? 0;
    if (isError(a)) return a;
    if (isError(b)) return b;
    const [x, y] = typeof a === 'string' && typeof b === 'string' ? [a.toLowerCase(), b.toLowerCase()] : [a, b];
    const results: Record<string, boolean> = { '=': x === y, '<>': x !== y, '>=': x >= y, '<=': x <= y, '>': x > y, '<': x < y };
    return results[op];
  }

  private additive(): Value {
    let left = this.multiplicative();
    while (this.peek() === '+' || this.peek() === '-') {
      const op = this.take();
      left = this.arithmetic(left, this.multiplicative(), (a, b) => (op === '+' ? a + b : a - b));
    }
    return left;
  }

  private multiplicative(): Value {
    let left = this.unary();
    while (this.peek() === '*' || this.peek() === '/') {
      const op = this.take();
      left = this.arithmetic(left, this.unary(), (a, b) => (op === '*' ? a * b : b === 0 ? Number.NaN : a / b));
    }
    return left;
  }

  private unary(): Value {
    if (this.peek() === '-') {
      this.take();
      return this.arithmetic(0, this.unary(), (a, b) => a - b);
    }
    return this.primary();
  }

  private arithmetic(a: Value, b: Value, op: (x: number, y: number) => number): Scalar {
    const x = this.number(a);
    const y = this.number(b);
    if (isError(x)) return x;
    if (isError(y)) return y;
    const result = op(x, y);
    return Number.isNaN(result) ? { error: '#DIV/0!' } : result;
  }

  private primary(): Value {
    const token = this.take();
    if (token === '(') {
      const inner = this.comparison();
      this.take(')');
      return inner;
    }
    if (token.startsWith('"')) return token.slice(1, -1).replace(/""/g, '"');
    if (/^\d/.test(token)) return Number(token);
    if (this.peek() === '(') return this.call(token);
    const [sheet, range] = token.includes('!') ? token.split('!') : [this.sheet, token];
    const values = addressesOf(range).map((a) => this.book.cell(sheet, a));
    return range.includes(':') ? values : values[0];
  }

  /** Arguments are parsed lazily so IF evaluates only the branch it takes, as Excel does. */
  private call(name: string): Value {
    this.take('(');
    const args: (() => Value)[] = [];
    while (this.peek() !== ')') {
      const start = this.at;
      this.skipArgument();
      const end = this.at;
      args.push(() => new FormulaEvaluation(this.book, this.sheet, this.tokens.slice(start, end)).run());
      if (this.peek() === ',') this.take(',');
    }
    this.take(')');
    return this.apply(name, args);
  }

  private skipArgument(): void {
    let depth = 0;
    while (this.at < this.tokens.length) {
      const t = this.tokens[this.at];
      if (depth === 0 && (t === ',' || t === ')')) return;
      if (t === '(') depth++;
      if (t === ')') depth--;
      this.at++;
    }
  }

  private apply(name: string, args: (() => Value)[]): Value {
    const numbers = (): number[] | { error: string } => {
      const all = args.flatMap((a) => {
        const v = a();
        return Array.isArray(v) ? v.filter((x) => typeof x === 'number' || isError(x)) : [this.number(v)];
      });
      const error = all.find(isError);
      return error ?? (all as number[]);
    };
    const one = (): number | { error: string } => this.number(args[0]());
    switch (name) {
      case 'IF': {
        const test = this.scalar(args[0]()) ?? 0;
        if (isError(test)) return test;
        return test === true || (typeof test === 'number' && test !== 0) ? args[1]() : args[2]();
      }
      case 'NOT': {
        const v = this.scalar(args[0]()) ?? 0;
        return isError(v) ? v : !v;
      }
      case 'ISNUMBER':
        return typeof this.scalar(args[0]()) === 'number';
      case 'ABS': {
        const v = one();
        return isError(v) ? v : Math.abs(v);
      }
      case 'LOG10': {
        const v = one();
        return isError(v) ? v : v <= 0 ? { error: '#NUM!' } : Math.log10(v);
      }
      case 'MIN':
      case 'MAX':
      case 'SUM': {
        const v = numbers();
        if (!Array.isArray(v)) return v;
        return name === 'SUM' ? v.reduce((s, x) => s + x, 0) : (name === 'MIN' ? Math.min : Math.max)(...v);
      }
      case 'COUNTIF': {
        const range = args[0]();
        const criterion = String(this.scalar(args[1]())).toLowerCase();
        return (Array.isArray(range) ? range : [range]).filter((v) => typeof v === 'string' && v.toLowerCase() === criterion).length;
      }
      default:
        throw new Error(`The self-check's arithmetic does not use ${name}.`);
    }
  }

  private scalar(v: Value): Scalar | null {
    if (Array.isArray(v)) throw new Error('A range where one value belongs.');
    return v;
  }

  private number(v: Value): number | { error: string } {
    const s = this.scalar(v);
    if (s === null) return 0;
    if (isError(s)) return s;
    if (typeof s === 'number') return s;
    if (typeof s === 'boolean') return s ? 1 : 0;
    if (s === '') return 0;
    const parsed = Number(s);
    return Number.isFinite(parsed) ? parsed : { error: '#VALUE!' };
  }
}
