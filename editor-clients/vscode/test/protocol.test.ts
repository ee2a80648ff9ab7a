// What the extension reads from the server's answers.

import * as assert from 'node:assert/strict';
import { describe, it } from 'node:test';
import { offersOf, readReportAnswer, unitChoices } from '../src/protocol';

describe('what the server offers', () => {
  it('finds the report among the commands and the refactors among the code actions', () => {
    assert.deepEqual(offersOf({ codeActionProvider: true, executeCommandProvider: { commands: ['plumb.showValue', 'plumb.writeReport'] } }),
      { writeReport: true, showInUnit: true });
    assert.deepEqual(offersOf({ codeActionProvider: { codeActionKinds: ['quickfix', 'refactor'] } }),
      { writeReport: false, showInUnit: true });
  });

  it('offers nothing a server does not list', () => {
    assert.deepEqual(offersOf(undefined), { writeReport: false, showInUnit: false });
    assert.deepEqual(offersOf({}), { writeReport: false, showInUnit: false });
    assert.deepEqual(offersOf({ codeActionProvider: false, executeCommandProvider: { commands: ['plumb.showValue'] } }),
      { writeReport: false, showInUnit: false });
    assert.deepEqual(offersOf({ codeActionProvider: { codeActionKinds: ['quickfix'] } }), { writeReport: false, showInUnit: false });
  });
});

describe('units to show a value in', () => {
  it('keeps the refactors that carry an edit, in the server\'s order', () => {
    const edit = { changes: { 'file:///c.plumb': [] } };
    const choices = unitChoices([
      { title: 'Insert the missing *', kind: 'quickfix', edit },
      { title: 'Show F in SI (N)', kind: 'refactor.rewrite', edit },
      { title: 'Show F in kN', kind: 'refactor.rewrite', edit },
      { title: 'A command, not an action', command: 'x' },
      { title: 'Show F in lbf', kind: 'refactor.rewrite' },
      { title: 'Extract', kind: 'refactor.extract', edit },
    ]);
    assert.deepEqual(choices.map((c) => c.title), ['Show F in SI (N)', 'Show F in kN']);
    assert.equal(choices[0].edit, edit);
  });

  it('reads no answer as no choices', () => {
    assert.deepEqual(unitChoices(null), []);
    assert.deepEqual(unitChoices(undefined), []);
  });
});

describe('the report answer', () => {
  it('reads the uri, path, message and where it went', () => {
    assert.deepEqual(readReportAnswer({ uri: 'file:///tmp/plumb-reports-1/pod.html', path: '/tmp/plumb-reports-1/pod.html',
      beside: false, message: 'Wrote the report of pod.plumb to /tmp/plumb-reports-1/pod.html: it is not saved yet' }),
    { ok: true, report: { uri: 'file:///tmp/plumb-reports-1/pod.html', path: '/tmp/plumb-reports-1/pod.html', beside: false,
      message: 'Wrote the report of pod.plumb to /tmp/plumb-reports-1/pod.html: it is not saved yet' } });
  });

  it('says what is wrong with an answer that is not a report', () => {
    assert.deepEqual(readReportAnswer(null), { ok: false, problem: 'the server wrote no report (its answer was empty)' });
    assert.deepEqual(readReportAnswer({ path: '/tmp/x.html' }),
      { ok: false, problem: 'the server answered without the report\'s uri, path and message' });
  });
});
