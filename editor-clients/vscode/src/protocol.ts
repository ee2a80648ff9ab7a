// What the extension reads from the server's answers: which of its commands the server offers,
// the "show in …" refactors among its code actions, and the answer of plumb.writeReport. Plain
// protocol data, no editor API.

import type { CodeAction, Command, ServerCapabilities, WorkspaceEdit } from 'vscode-languageserver-protocol';

/** The server's command that writes the printable report of an open calc (editor-clients/README.md). */
export const WRITE_REPORT = 'plumb.writeReport';
/** The command of the server's value lenses; the language client registers it, so no command of ours may use the id. */
export const SHOW_VALUE = 'plumb.showValue';
/** The code action kind of the server's "Show NAME in UNIT" refactors. */
export const REWRITE = 'refactor.rewrite';

/** The extension's commands that depend on the server, and whether the running server offers each. */
export interface Offers {
  /** The report: the server lists plumb.writeReport among its commands. */
  writeReport: boolean;
  /** A value in another unit: the server answers code actions (its refactors are among them). */
  showInUnit: boolean;
}

export const NOTHING_OFFERED: Offers = { writeReport: false, showInUnit: false };

export function offersOf(capabilities: ServerCapabilities | undefined): Offers {
  if (!capabilities) return NOTHING_OFFERED;
  const commands = capabilities.executeCommandProvider?.commands ?? [];
  const actions = capabilities.codeActionProvider;
  const kinds = typeof actions === 'object' && actions !== null ? actions.codeActionKinds : undefined;
  const rewrites = kinds === undefined || kinds.some((k) => REWRITE === k || REWRITE.startsWith(k + '.'));
  return {
    writeReport: commands.includes(WRITE_REPORT),
    showInUnit: actions !== undefined && actions !== false && rewrites,
  };
}

/** One unit to show a value in, as the server offers it ("Show F_D in kN"), with its edit. */
export interface UnitChoice {
  title: string;
  edit: WorkspaceEdit;
}

/**
 * The server's refactors among its code actions at the cursor: actions of kind refactor.rewrite
 * that carry an edit (quick fixes for findings are left to the editor's light bulb).
 */
export function unitChoices(actions: ReadonlyArray<Command | CodeAction> | null | undefined): UnitChoice[] {
  const out: UnitChoice[] = [];
  for (const a of actions ?? []) {
    if (!('kind' in a) || typeof a.kind !== 'string' || !a.edit) continue;
    if (a.kind !== REWRITE && !a.kind.startsWith(REWRITE + '.')) continue;
    out.push({ title: a.title, edit: a.edit });
  }
  return out;
}

/** The answer of plumb.writeReport. */
export interface ReportAnswer {
  uri: string;
  path: string;
  message: string;
  /** False when the report went to the server's temporary folder instead of beside the calc. */
  beside: boolean;
}

/** The answer as the server documents it, or a sentence saying what was wrong with it. */
export function readReportAnswer(answer: unknown): { ok: true; report: ReportAnswer } | { ok: false; problem: string } {
  if (typeof answer !== 'object' || answer === null) {
    return { ok: false, problem: 'the server wrote no report (its answer was empty)' };
  }
  const a = answer as Record<string, unknown>;
  if (typeof a.uri !== 'string' || typeof a.path !== 'string' || typeof a.message !== 'string') {
    return { ok: false, problem: 'the server answered without the report\'s uri, path and message' };
  }
  return { ok: true, report: { uri: a.uri, path: a.path, message: a.message, beside: a.beside !== false } };
}
