// The extension's logic against the real language server, with no editor: the server is started
// with the command the extension resolves (resolveLaunch, from a given extension folder), and a
// JSON-RPC connection does what the language client does for the extension — the settings in
// initialize, the answer to workspace/configuration, a settings change, the server's refactors at a
// value (read with unitChoices) and the report (read with readReportAnswer).

import * as assert from 'node:assert/strict';
import * as cp from 'child_process';
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import {
  createProtocolConnection, StreamMessageReader, StreamMessageWriter, type ProtocolConnection,
} from 'vscode-languageserver-protocol/node';
import type { InlayHint, InitializeResult } from 'vscode-languageserver-protocol';
import { resolveLaunch, type Host, type ServerLaunch } from '../../src/launch';
import { offersOf, readReportAnswer, unitChoices } from '../../src/protocol';
import { configurationAnswer, launchSettings, serverSettings, type SettingsReader } from '../../src/settings';

/** The package.json defaults, as the editor hands them over, with some keys changed. */
export function settingsWith(changes: Record<string, unknown>): SettingsReader {
  const values: Record<string, unknown> = {
    significantFigures: 4, criticalReynolds: null, showValuesAs: 'auto', debounceMs: 100, evaluateOnSaveOnly: false,
    maxFileBytes: 2097152, 'server.java': '', 'server.javaOptions': ['-Xmx1g'], 'server.jar': '',
    'server.useInstalledPlumb': false, ...changes,
  };
  return { get: <T>(key: string) => values[key] as T | undefined };
}

/** This machine, seen from an extension installed in `extensionPath`. */
export function realHost(extensionPath: string): Host {
  return {
    platform: process.platform,
    env: process.env,
    extensionPath,
    homeDir: os.homedir(),
    isFile: (f) => {
      try {
        return fs.statSync(f).isFile();
      } catch {
        return false;
      }
    },
  };
}

/** The command the extension installed in `extensionPath` would start, or why there is none. */
export function launchFrom(extensionPath: string): { ok: true; launch: ServerLaunch } | { ok: false; problem: string } {
  return resolveLaunch(launchSettings(settingsWith({})), realHost(extensionPath));
}

// An invented calc: drag on a camera pod in a rig's air stream (editor test data, not a design).
const POD = [
  'title "Camera pod in a rig air stream (extension test, invented data)"',
  'input d   = 0.15 m            "pod diameter"',
  'input V   = 18 m/s            "fan speed at the pod station"',
  'input rho = 1.18 kg/m^3       as fluid',
  'A = pi / 4 * d^2              as frontal',
  'q = 0.5 * rho * V^2           in Pa',
  'F = 0.47 * A * q              in N',
  '',
].join('\n');
const LINE_Q = 5;
const LINE_F = 6;

async function until<T>(what: string, probe: () => Promise<T | undefined>, ms = 20000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const value = await probe();
    if (value !== undefined) return value;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/**
 * Runs the whole exchange against the server `launch` starts. Every step asserts what the
 * extension relies on; the server is shut down at the end whatever happens.
 */
export async function exerciseServer(launch: ServerLaunch): Promise<void> {
  const work = fs.mkdtempSync(path.join(os.tmpdir(), 'plumb-extension-test-'));
  fs.mkdirSync(path.join(work, '.git'));
  const calc = path.join(work, 'pod.plumb');
  fs.writeFileSync(calc, POD);
  const uri = `file://${calc}`;
  const server = cp.spawn(launch.command, launch.args, {
    env: { ...process.env, ...launch.env }, stdio: ['pipe', 'pipe', 'pipe'], shell: launch.shell,
  });
  let stderr = '';
  server.stderr.on('data', (d: Buffer) => {
    stderr += d.toString();
  });
  const connection: ProtocolConnection = createProtocolConnection(
    new StreamMessageReader(server.stdout), new StreamMessageWriter(server.stdin));
  // What the editor's settings say when the server asks for them (the extension's middleware).
  let editorSettings = settingsWith({ significantFigures: 6 });
  let configured: () => void = () => undefined;
  const asked = new Promise<void>((resolve) => {
    configured = resolve;
  });
  connection.onRequest('workspace/configuration', (params: { items: Array<{ section?: string }> }) => {
    setImmediate(configured);
    return configurationAnswer(params.items, () => serverSettings(editorSettings));
  });
  connection.onRequest('client/registerCapability', () => null);
  connection.onRequest('workspace/inlayHint/refresh', () => null);
  connection.onRequest('workspace/codeLens/refresh', () => null);
  connection.onNotification('textDocument/publishDiagnostics', () => undefined);
  connection.onNotification('window/showMessage', () => undefined);
  connection.onNotification('window/logMessage', () => undefined);
  connection.listen();
  let text = POD;
  let version = 1;
  try {
    const init = await connection.sendRequest('initialize', {
      processId: process.pid,
      clientInfo: { name: 'plumb-extension-test' },
      rootUri: `file://${work}`,
      workspaceFolders: [{ uri: `file://${work}`, name: 'work' }],
      capabilities: {
        general: { positionEncodings: ['utf-16'] },
        textDocument: {
          synchronization: { dynamicRegistration: false },
          inlayHint: { dynamicRegistration: false },
          codeAction: { codeActionLiteralSupport: { codeActionKind: { valueSet: ['quickfix', 'refactor', 'refactor.rewrite'] } } },
          publishDiagnostics: {},
        },
        workspace: { configuration: true, inlayHint: { refreshSupport: true }, didChangeConfiguration: {} },
      },
      // The extension sends the editor's settings with initialize; the defaults here.
      initializationOptions: serverSettings(settingsWith({})),
    }) as InitializeResult;
    assert.deepEqual(offersOf(init.capabilities), { writeReport: true, showInUnit: true },
      'the server offers the report and the refactors');
    await connection.sendNotification('initialized', {});
    // Open the calc once the server has its settings, as an editor that opens a file a moment
    // later would: an analysis already running when settings change may keep the old ones.
    let timer: NodeJS.Timeout | undefined;
    await Promise.race([asked, new Promise((_, reject) => {
      timer = setTimeout(() => reject(new Error('the server never asked for the settings (workspace/configuration)')), 20000);
    })]).finally(() => clearTimeout(timer));
    await connection.sendNotification('textDocument/didOpen', {
      textDocument: { uri, languageId: 'plumb', version, text },
    });

    const label = async (line: number): Promise<string | undefined> => {
      const hints = await connection.sendRequest('textDocument/inlayHint', {
        textDocument: { uri }, range: { start: { line: 0, character: 0 }, end: { line: text.split('\n').length, character: 0 } },
      }) as InlayHint[] | null;
      const hint = (hints ?? []).find((h) => h.position.line === line);
      if (!hint) return undefined;
      return typeof hint.label === 'string' ? hint.label : hint.label.map((p) => p.value).join('');
    };
    // The server asked for the settings after initialized; the answer (6 figures) wins over the
    // defaults of initialize. by hand: q = 0.5 × 1.18 kg/m³ × (18 m/s)² = 0.59 × 324 = 191.16 Pa.
    await until('the value of q with six significant figures', async () => {
      const l = await label(LINE_Q);
      return l !== undefined && l.includes('191.16 Pa') ? l : undefined;
    });
    // A settings change reaches the running server as the extension sends it. 191.16 Pa to three figures is 191 Pa.
    editorSettings = settingsWith({ significantFigures: 3 });
    await connection.sendNotification('workspace/didChangeConfiguration', { settings: { plumb: serverSettings(editorSettings) } });
    await until('the value of q with three significant figures', async () => {
      const l = await label(LINE_Q);
      return l !== undefined && /\b191 Pa/.test(l) ? l : undefined;
    });

    // The refactors at F: its value in other units; the extension lists exactly these.
    const actions = await connection.sendRequest('textDocument/codeAction', {
      textDocument: { uri },
      range: { start: { line: LINE_F, character: 2 }, end: { line: LINE_F, character: 2 } },
      context: { diagnostics: [], only: ['refactor.rewrite'], triggerKind: 1 },
    });
    const choices = unitChoices(actions as never);
    const titles = choices.map((c) => c.title);
    assert.ok(titles.includes('Show F in kN') && titles.includes('Show F in lbf'), `refactors at F: ${titles.join('; ')}`);
    const kN = choices.find((c) => c.title === 'Show F in kN')!;
    const edits = kN.edit.changes?.[uri] ?? [];
    assert.equal(edits.length, 1, JSON.stringify(kN.edit));
    const lines = text.split('\n');
    const e = edits[0];
    assert.equal(e.range.start.line, LINE_F);
    assert.equal(e.range.end.line, LINE_F);
    const line = lines[LINE_F];
    lines[LINE_F] = line.slice(0, e.range.start.character) + e.newText + line.slice(e.range.end.character);
    assert.match(lines[LINE_F], /^F = 0\.47 \* A \* q\s+in kN$/);
    text = lines.join('\n');
    await connection.sendNotification('textDocument/didChange', {
      textDocument: { uri, version: ++version }, contentChanges: [{ text }],
    });
    // by hand: F = 0.47 × (π/4 × 0.15² m²) × 191.16 Pa = 0.47 × 0.017671 m² × 191.16 Pa = 1.588 N = 0.00159 kN (3 figures)
    await until('F shown in kN', async () => {
      const l = await label(LINE_F);
      return l !== undefined && l.includes('0.00159 kN') ? l : undefined;
    });

    // The report of the text as it is in the editor (F now in kN, not saved), beside the calc.
    const answer = await connection.sendRequest('workspace/executeCommand', { command: 'plumb.writeReport', arguments: [uri] });
    const read = readReportAnswer(answer);
    assert.ok(read.ok, JSON.stringify(answer));
    assert.equal(read.report.path, path.join(work, 'pod.html'));
    assert.equal(read.report.beside, true);
    assert.match(read.report.message, /pod\.html/);
    const html = fs.readFileSync(read.report.path, 'utf8');
    assert.match(html, /Camera pod in a rig air stream/);
    assert.match(html, /kN/);

    // A URI the server has not opened is refused in words, which the extension shows as they are.
    await assert.rejects(
      connection.sendRequest('workspace/executeCommand', { command: 'plumb.writeReport', arguments: [`file://${work}/other.plumb`] }),
      (err: Error) => err.message.length > 10,
    );

    await connection.sendRequest('shutdown');
    await connection.sendNotification('exit');
    const code = await new Promise<number | null>((resolve) => {
      if (server.exitCode !== null) resolve(server.exitCode);
      else server.on('exit', (c) => resolve(c));
    });
    assert.equal(code, 0, 'the server exits cleanly after shutdown');
  } catch (e) {
    (e as Error).message += `\n--- server stderr ---\n${stderr.slice(-3000)}`;
    throw e;
  } finally {
    connection.dispose();
    if (server.exitCode === null) server.kill();
    fs.rmSync(work, { recursive: true, force: true });
  }
}
