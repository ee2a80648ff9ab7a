// The TextMate grammar run by the same tokenizer the editor uses (vscode-textmate with the
// Oniguruma regular expressions of vscode-oniguruma), and a check of fixture files whose expected
// scopes are written in them, as annotation lines under the line they describe:
//
//   input V = 26 m/s   "design gust"
//   #<^^^^ keyword.other.input.plumb
//   #         ^^^^^^ constant.numeric.quantity.plumb -string.quoted.double.note.plumb
//
// An annotation line starts with `#` in column 0, then carets under the range (columns count
// characters, code points; `#<` marks column 0), then scopes. A scope must cover exactly the
// range: every character under the carets has it, and the characters just before and after do
// not (so `m/s` is one token of `keyword.other.unit.plumb`, not three) — except a `meta.` scope,
// which spans a whole statement or block and need only cover the range. `-scope` means no
// character under the carets has it. Annotation lines are left out of the text that is
// tokenized.

import * as fs from 'fs';
import * as path from 'path';
import * as oniguruma from 'vscode-oniguruma';
import * as textmate from 'vscode-textmate';

const ROOT = path.resolve(__dirname, '..', '..', '..');
export const GRAMMAR_FILE = path.join(ROOT, 'syntaxes', 'plumb.tmLanguage.json');

let grammar: Promise<textmate.IGrammar> | undefined;

/** The grammar of syntaxes/plumb.tmLanguage.json, loaded once. */
export function loadGrammar(): Promise<textmate.IGrammar> {
  grammar ??= (async () => {
    const wasm = fs.readFileSync(require.resolve('vscode-oniguruma/release/onig.wasm'));
    await oniguruma.loadWASM(wasm.buffer.slice(wasm.byteOffset, wasm.byteOffset + wasm.byteLength));
    const registry = new textmate.Registry({
      onigLib: Promise.resolve({
        createOnigScanner: (patterns: string[]) => new oniguruma.OnigScanner(patterns),
        createOnigString: (s: string) => new oniguruma.OnigString(s),
      }),
      loadGrammar: async (scopeName: string) => scopeName === 'source.plumb'
        ? textmate.parseRawGrammar(fs.readFileSync(GRAMMAR_FILE, 'utf8'), GRAMMAR_FILE)
        : null,
    });
    const g = await registry.loadGrammar('source.plumb');
    if (!g) throw new Error(`no grammar source.plumb in ${GRAMMAR_FILE}`);
    return g;
  })();
  return grammar;
}

/** The scopes of each UTF-16 unit of each line, the lines tokenized in order as the editor does. */
export async function scopesOf(lines: string[]): Promise<string[][][]> {
  const g = await loadGrammar();
  let stack = textmate.INITIAL;
  const out: string[][][] = [];
  for (const line of lines) {
    const r = g.tokenizeLine(line, stack, 1000);
    if (r.stoppedEarly) throw new Error(`the tokenizer gave up on the line: ${line}`);
    stack = r.ruleStack;
    const perUnit: string[][] = new Array(line.length);
    for (const t of r.tokens) {
      for (let i = t.startIndex; i < Math.min(t.endIndex, line.length); i++) perUnit[i] = t.scopes;
    }
    out.push(perUnit);
  }
  return out;
}

interface Expectation {
  /** 1-based line of the fixture file the annotation stands on. */
  fileLine: number;
  /** Index of the tokenized line it describes. */
  target: number;
  /** Code-point columns, end exclusive. */
  from: number;
  to: number;
  present: string[];
  absent: string[];
}

const ANNOTATION = /^#(<?)(\s*)(\^*)\s+(\S.*)$/;

/** Splits a fixture into the lines to tokenize and the expectations written under them. */
export function parseFixture(text: string): { lines: string[]; expectations: Expectation[] } {
  const lines: string[] = [];
  const expectations: Expectation[] = [];
  text.split('\n').forEach((raw, index) => {
    const m = ANNOTATION.exec(raw);
    if (!m || (m[1] === '' && m[3] === '')) {
      lines.push(raw);
      return;
    }
    if (lines.length === 0) throw new Error(`line ${index + 1}: an annotation needs a line above it`);
    const [, zero, gap, carets, scopes] = m;
    const from = zero ? 0 : 1 + gap.length;
    const to = zero ? 1 + gap.length + carets.length : from + carets.length;
    if (zero && gap.length > 0) throw new Error(`line ${index + 1}: write #<^^ with no blank after <`);
    const words = scopes.trim().split(/\s+/);
    expectations.push({
      fileLine: index + 1, target: lines.length - 1, from, to,
      present: words.filter((w) => !w.startsWith('-')),
      absent: words.filter((w) => w.startsWith('-')).map((w) => w.slice(1)),
    });
  });
  return { lines, expectations };
}

/** UTF-16 index of a code-point column. */
function unitIndex(line: string, column: number): number {
  let units = 0;
  let points = 0;
  for (const ch of line) {
    if (points === column) return units;
    units += ch.length;
    points++;
  }
  return units + (column - points);
}

/** Every way the fixture's tokens differ from its annotations, as readable lines; empty when none. */
export async function checkFixture(text: string): Promise<{ count: number; failures: string[] }> {
  const { lines, expectations } = parseFixture(text);
  const scopes = await scopesOf(lines);
  const failures: string[] = [];
  for (const e of expectations) {
    const line = lines[e.target];
    const from = unitIndex(line, e.from);
    const to = unitIndex(line, e.to);
    const at = (i: number) => (i >= 0 && i < line.length ? scopes[e.target][i] ?? [] : []);
    const where = `fixture line ${e.fileLine}, columns ${e.from}-${e.to - 1} ("${line.slice(from, to)}" in: ${line})`;
    if (to > line.length) {
      failures.push(`${where}: the carets run past the end of the line`);
      continue;
    }
    const actual = () => [...new Set(Array.from({ length: to - from }, (_, k) => at(from + k).slice(1).join(' ')))]
      .map((s) => `    ${s}`).join('\n');
    for (const scope of e.present) {
      for (let i = from; i < to; i++) {
        if (!at(i).includes(scope)) {
          failures.push(`${where}: "${line[i]}" at ${i} lacks ${scope}; the range has\n${actual()}`);
          break;
        }
      }
      if (scope.startsWith('meta.')) continue;
      if (at(from - 1).includes(scope)) failures.push(`${where}: ${scope} starts before the range`);
      if (at(to).includes(scope)) failures.push(`${where}: ${scope} goes on after the range`);
    }
    for (const scope of e.absent) {
      if (Array.from({ length: to - from }, (_, k) => from + k).some((i) => at(i).includes(scope))) {
        failures.push(`${where}: ${scope} should not be there; the range has\n${actual()}`);
      }
    }
  }
  return { count: expectations.length, failures };
}
