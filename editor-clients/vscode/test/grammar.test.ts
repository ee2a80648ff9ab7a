// The TextMate grammar, tokenized as the editor does: the annotated fixture (every statement kind,
// units with / ^ · and parentheses, Unicode names, narrative against comment, strings with
// escapes), and every calc of the repository (samples and standard library) read without a
// finding of the grammar's own.

import * as assert from 'node:assert/strict';
import * as fs from 'fs';
import { describe, it } from 'node:test';
import * as path from 'path';
import { checkFixture, parseFixture, scopesOf } from './grammar/tokenize';

const EXTENSION = path.resolve(__dirname, '..', '..');
const REPOSITORY = path.resolve(EXTENSION, '..', '..');

function calcsUnder(dir: string): string[] {
  const out: string[] = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const file = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...calcsUnder(file));
    else if (entry.name.endsWith('.plumb')) out.push(file);
  }
  return out.sort();
}

describe('grammar fixture', () => {
  it('gives every annotated range exactly its expected scopes', async () => {
    const text = fs.readFileSync(path.join(EXTENSION, 'test', 'fixtures', 'grammar.plumb'), 'utf8');
    const { count, failures } = await checkFixture(text);
    assert.ok(count >= 100, `the fixture holds only ${count} expectations`);
    assert.deepEqual(failures, []);
  });

  it('reports a wrong expectation, a range too short and a scope that should be absent', async () => {
    const wrong = [
      'input V = 26 m/s',
      '#<^^^^ keyword.control.check.plumb',
      `#${' '.repeat(13)}^^ keyword.other.unit.plumb`, // "/s": the unit starts at "m"
      `#${' '.repeat(12)}^^ keyword.other.unit.plumb`, // "m/": the unit goes on
      `#${' '.repeat(9)}^^ -constant.numeric.value.plumb`, // "26" is a number
    ].join('\n');
    const { count, failures } = await checkFixture(wrong);
    assert.equal(count, 4);
    assert.equal(failures.length, 4, failures.join('\n'));
    assert.match(failures[0], /lacks keyword\.control\.check\.plumb/);
    assert.match(failures[1], /keyword\.other\.unit\.plumb starts before the range/);
    assert.match(failures[2], /keyword\.other\.unit\.plumb goes on after the range/);
    assert.match(failures[3], /constant\.numeric\.value\.plumb should not be there/);
  });

  it('counts columns in characters, also after a name outside the Basic Multilingual Plane', () => {
    const { lines, expectations } = parseFixture('𝑥_Δ = 5 mm\n#     ^^^^ constant.numeric.quantity.plumb\n#<^^ entity.name.variable.plumb');
    assert.deepEqual(lines, ['𝑥_Δ = 5 mm']);
    assert.deepEqual(expectations.map((e) => [e.from, e.to]), [[6, 10], [0, 3]]);
  });
});

describe('the repository\'s calcs', () => {
  const calcs = [...calcsUnder(path.join(REPOSITORY, 'samples')),
    ...calcsUnder(path.join(REPOSITORY, 'server', 'src', 'main', 'resources', 'stdlib'))];

  it('finds the samples and the standard library', () => {
    assert.ok(calcs.length >= 15, `found only ${calcs.length} calcs`);
  });

  it('tokenizes every line of them with no invalid scope and every unit after a number as one token', async () => {
    const problems: string[] = [];
    let units = 0;
    for (const file of calcs) {
      const lines = fs.readFileSync(file, 'utf8').split(/\r?\n/);
      const scopes = await scopesOf(lines);
      lines.forEach((line, n) => {
        const here = `${path.relative(REPOSITORY, file)}:${n + 1}`;
        const invalid = scopes[n].flat().find((s) => s.startsWith('invalid.'));
        if (invalid) problems.push(`${here}: ${invalid} in: ${line}`);
        // A unit token is never cut: it is followed by a blank, the end of the line, or a character
        // that cannot be part of a unit.
        for (let i = 0; i < line.length; i++) {
          const isUnit = (k: number) => (scopes[n][k] ?? []).includes('keyword.other.unit.plumb');
          if (isUnit(i) && !isUnit(i + 1)) {
            units++;
            const next = line[i + 1];
            if (next !== undefined && !/[\s")+,\-−=<>≤≥≠#\]]/u.test(next)) {
              problems.push(`${here}: a unit ends before "${next}" in: ${line}`);
            }
          }
        }
      });
    }
    assert.ok(units > 250, `only ${units} units found`);
    assert.deepEqual(problems, []);
  });
});
