/**
 * The preview's formula language: what Plumbline's users type and its reports write, and no more.
 * A formula is a function call (`=PLUMB.TERMS(B1:B61, 'Planned batches'!$C$1:$F$6, 0.9, , FALSE)`),
 * a reference (`=B2`), a constant, or a division of those (`=4/COUNT(A2:A61)`); `/` is the one
 * operator, taken left to right as Excel's equal-precedence operators are ("Calculation operators
 * and precedence in Excel", Microsoft Support). Arguments may be left empty, which passes an
 * omitted argument.
 */
import { parseRange } from '../../addressing/a1';
import type { RangeRef } from './types';

export type Expression =
  | { kind: 'call'; name: string; args: (Expression | null)[] }
  | { kind: 'reference'; range: RangeRef }
  | { kind: 'number'; value: number }
  | { kind: 'text'; value: string }
  | { kind: 'boolean'; value: boolean }
  | { kind: 'divide'; dividend: Expression; divisor: Expression };

export class FormulaSyntaxError extends Error {}

export function parseFormula(formula: string, currentSheet: string): Expression {
  const parser = new Parser(formula.replace(/^=/, ''), currentSheet);
  const expression = parser.expression();
  parser.skipSpace();
  if (!parser.atEnd()) throw new FormulaSyntaxError(`Unexpected "${parser.rest()}" in the formula.`);
  return expression;
}

/** Every range a formula reads, for dependency tracking. */
export function referencedRanges(expression: Expression): RangeRef[] {
  if (expression.kind === 'reference') return [expression.range];
  if (expression.kind === 'call') return expression.args.flatMap((a) => (a === null ? [] : referencedRanges(a)));
  if (expression.kind === 'divide') return [...referencedRanges(expression.dividend), ...referencedRanges(expression.divisor)];
  return [];
}

class Parser {
  private at = 0;

  constructor(
    private readonly text: string,
    private readonly sheet: string,
  ) {}

  atEnd(): boolean {
    return this.at >= this.text.length;
  }

  rest(): string {
    return this.text.slice(this.at);
  }

  skipSpace(): void {
    while (!this.atEnd() && /\s/.test(this.text[this.at])) this.at++;
  }

  expression(): Expression {
    let expression = this.operand();
    for (;;) {
      this.skipSpace();
      if (this.text[this.at] !== '/') return expression;
      this.at++;
      expression = { kind: 'divide', dividend: expression, divisor: this.operand() };
    }
  }

  private operand(): Expression {
    this.skipSpace();
    const ch = this.text[this.at];
    if (ch === undefined) throw new FormulaSyntaxError('The formula is incomplete.');
    if (ch === '"') return this.textLiteral();
    if (/[-+\d.]/.test(ch)) return this.numberLiteral();
    if (ch === "'") return this.reference(this.quotedSheet());
    const word = this.word();
    this.skipSpace();
    if (this.text[this.at] === '(') return this.call(word);
    if (this.text[this.at] === '!') return this.reference(word);
    const upper = word.toUpperCase();
    if (upper === 'TRUE' || upper === 'FALSE') return { kind: 'boolean', value: upper === 'TRUE' };
    return this.referenceFrom(word, undefined);
  }

  private word(): string {
    const m = /^[A-Za-z_$][A-Za-z0-9_.$]*/.exec(this.rest());
    if (!m) throw new FormulaSyntaxError(`Unexpected "${this.rest()}" in the formula.`);
    this.at += m[0].length;
    return m[0];
  }

  private quotedSheet(): string {
    const m = /^'((?:[^']|'')+)'/.exec(this.rest());
    if (!m) throw new FormulaSyntaxError('A quoted sheet name is not closed.');
    this.at += m[0].length;
    return m[1].replace(/''/g, "'");
  }

  private reference(sheet: string): Expression {
    if (this.text[this.at] !== '!') throw new FormulaSyntaxError(`Expected "!" after the sheet name ${sheet}.`);
    this.at++;
    return this.referenceFrom(this.word(), sheet);
  }

  private referenceFrom(first: string, sheet: string | undefined): Expression {
    let address = first;
    if (this.text[this.at] === ':') {
      this.at++;
      address += `:${this.word()}`;
    }
    const range = parseRange(address, sheet ?? this.sheet);
    if (!range) throw new FormulaSyntaxError(`"${address}" is not a cell or range address.`);
    if (sheet !== undefined) range.sheet = sheet;
    return { kind: 'reference', range };
  }

  private call(name: string): Expression {
    this.at++;
    const args: (Expression | null)[] = [];
    this.skipSpace();
    if (this.text[this.at] === ')') {
      this.at++;
      return { kind: 'call', name: name.toUpperCase(), args };
    }
    for (;;) {
      this.skipSpace();
      const next = this.text[this.at];
      args.push(next === ',' || next === ')' ? null : this.expression());
      this.skipSpace();
      const sep = this.text[this.at];
      this.at++;
      if (sep === ')') return { kind: 'call', name: name.toUpperCase(), args };
      if (sep !== ',') throw new FormulaSyntaxError(`Expected "," or ")" in the call to ${name}.`);
    }
  }

  private numberLiteral(): Expression {
    const m = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?/.exec(this.rest());
    if (!m) throw new FormulaSyntaxError(`Unexpected "${this.rest()}" in the formula.`);
    this.at += m[0].length;
    return { kind: 'number', value: Number(m[0]) };
  }

  private textLiteral(): Expression {
    const m = /^"((?:[^"]|"")*)"/.exec(this.rest());
    if (!m) throw new FormulaSyntaxError('A text value is not closed with ".');
    this.at += m[0].length;
    return { kind: 'text', value: m[1].replace(/""/g, '"') };
  }
}
