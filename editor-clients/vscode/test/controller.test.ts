// The extension's wiring with a stand-in editor (stub/vscode.ts) and a stand-in language client:
// which commands exist, what reaches the server, and what the user sees.

import { changeSettings, logChannel, record, reset, Uri, WorkspaceEdit, type FakeEditor } from './stub/vscode';
import * as assert from 'node:assert/strict';
import { beforeEach, describe, it } from 'node:test';
import * as path from 'path';
import { COMMANDS, CONTEXT_KEYS, Controller, type ClientOptions, type PlumbClient } from '../src/controller';
import type { Host } from '../src/launch';
import { WRITE_REPORT } from '../src/protocol';

const EXTENSION = '/opt/editor/extensions/plumb';
const JAR = path.posix.join(EXTENSION, 'server', 'plumb.jar');

/** A machine with Java on the PATH and the jar bundled in the extension. */
function host(files: string[] = ['/usr/bin/java', JAR]): Host {
  return {
    platform: 'linux',
    env: { PATH: '/usr/local/bin:/usr/bin', LANG: 'en_GB.UTF-8' },
    extensionPath: EXTENSION,
    homeDir: '/home/eng',
    isFile: (f) => files.includes(f),
  };
}

interface Sent {
  method: string;
  params: unknown;
}

/** A language client that answers from a script and remembers what it was asked. */
class FakeClient implements PlumbClient {
  started = false;
  stopped = false;
  readonly requests: Sent[] = [];
  readonly notifications: Sent[] = [];
  answers = new Map<string, unknown>();
  failStart: Error | undefined;
  caps: Record<string, unknown> = {
    codeActionProvider: true,
    executeCommandProvider: { commands: ['plumb.showValue', WRITE_REPORT] },
  };
  constructor(readonly options: ClientOptions) {}
  async start(): Promise<void> {
    if (this.failStart) throw this.failStart;
    this.started = true;
  }
  async stop(): Promise<void> {
    this.stopped = true;
  }
  capabilities() {
    return this.started ? this.caps : undefined;
  }
  serverInfo() {
    return { name: 'plumb', version: '0.1.0' };
  }
  async sendRequest(method: string, params: unknown): Promise<unknown> {
    this.requests.push({ method, params });
    const answer = this.answers.get(method);
    if (answer instanceof Error) throw answer;
    return answer;
  }
  async sendNotification(method: string, params: unknown): Promise<void> {
    this.notifications.push({ method, params });
  }
  uriOf(uri: { toString(): string }): string {
    return uri.toString();
  }
  async workspaceEdit(edit: unknown): Promise<never> {
    const converted = new WorkspaceEdit();
    converted.entries.push(edit);
    return converted as never;
  }
}

/** Starts a controller; returns it with every client it made. */
async function activate(h: Host = host(), prepare: (c: FakeClient) => void = () => undefined) {
  const clients: FakeClient[] = [];
  const output = logChannel();
  const controller = new Controller(h, (options) => {
    const c = new FakeClient(options);
    prepare(c);
    clients.push(c);
    return c;
  }, output as never);
  await controller.activate();
  return { controller, clients, output };
}

function calcEditor(line = 4, character = 3, version = 7): FakeEditor {
  return {
    document: { uri: Uri.file('/work/calcs/pod.plumb'), languageId: 'plumb', version },
    selection: { active: { line, character } },
  };
}

/** Lets the promise callbacks of messages (their buttons) run. */
const settle = () => new Promise((r) => setImmediate(r));

beforeEach(() => reset());

describe('activation', () => {
  it('registers the four commands of package.json and none of the server\'s own', async () => {
    await activate();
    assert.deepEqual([...record.commands.keys()].sort(), Object.values(COMMANDS).sort());
    // The language client registers the commands the server lists; ours must not take those ids.
    assert.ok(!record.commands.has('plumb.writeReport'));
    assert.ok(!record.commands.has('plumb.showValue'));
  });

  it('starts the bundled jar with Java from the PATH and sends the server settings with initialize', async () => {
    record.settings.set('significantFigures', 6);
    record.settings.set('criticalReynolds', 3e5);
    record.settings.set('showValuesAs', 'auto');
    const { clients, output } = await activate();
    assert.equal(clients.length, 1);
    const { launch, initializationOptions } = clients[0].options;
    assert.equal(launch.command, '/usr/bin/java');
    assert.deepEqual(launch.args, ['-Xmx1g', '-Dfile.encoding=UTF-8', '-jar', JAR, 'lsp']);
    assert.deepEqual(initializationOptions, { significantFigures: 6, criticalReynolds: 3e5 });
    assert.ok(output.lines.some((l) => l.startsWith('info Starting the language server: /usr/bin/java -Xmx1g')));
    assert.ok(output.lines.includes('info The language server is running (plumb 0.1.0).'));
  });

  it('answers the server\'s workspace/configuration with the settings as they are then', async () => {
    const { clients } = await activate();
    record.settings.set('debounceMs', 250);
    record.settings.set('showValuesAs', 'codeLens');
    assert.deepEqual(clients[0].options.configuration(), {
      debounceMs: 250, inlayHints: false, codeLens: true, valueDiagnostics: false,
    });
  });

  it('lists the report and unit commands only when the server offers them', async () => {
    await activate();
    assert.equal(record.contexts.get(CONTEXT_KEYS.running), true);
    assert.equal(record.contexts.get(CONTEXT_KEYS.offersReport), true);
    assert.equal(record.contexts.get(CONTEXT_KEYS.offersUnits), true);
    reset();
    await activate(host(), (c) => {
      c.caps = { executeCommandProvider: { commands: ['plumb.showValue'] } };
    });
    assert.equal(record.contexts.get(CONTEXT_KEYS.offersReport), false);
    assert.equal(record.contexts.get(CONTEXT_KEYS.offersUnits), false);
  });

  it('says what is missing, and starts nothing, when there is no Java', async () => {
    record.button = 'Open Settings';
    const { clients, output } = await activate(host([JAR]));
    await settle();
    assert.equal(clients.length, 0);
    assert.equal(record.messages.length, 1);
    assert.equal(record.messages[0].level, 'error');
    assert.match(record.messages[0].text, /^Plumb: No Java found: the Plumb language server needs Java 17 or later/);
    assert.ok(output.lines.some((l) => l.startsWith('error No Java found')));
    assert.deepEqual(record.executed.find((e) => e.command === 'workbench.action.openSettings')?.args, ['plumb.server']);
    assert.equal(record.contexts.get(CONTEXT_KEYS.running), false);
  });

  it('shows why the server did not start, with the log a click away', async () => {
    record.button = 'Show Log';
    const { clients, output } = await activate(host(), (c) => {
      c.failStart = new Error('spawn /usr/bin/java EACCES');
    });
    await settle();
    assert.equal(clients[0].stopped, true);
    assert.equal(record.messages[0].level, 'error');
    assert.match(record.messages[0].text, /did not start \(spawn \/usr\/bin\/java EACCES\)/);
    assert.equal(output.shown, 1);
    assert.equal(record.contexts.get(CONTEXT_KEYS.running), false);
  });
});

describe('settings changes', () => {
  it('sends a changed server setting to the running server under the key "plumb"', async () => {
    const { clients } = await activate();
    changeSettings({ significantFigures: 3, evaluateOnSaveOnly: true });
    await settle();
    assert.deepEqual(clients[0].notifications, [{
      method: 'workspace/didChangeConfiguration',
      params: { settings: { plumb: { significantFigures: 3, diagnosticsOnSaveOnly: true } } },
    }]);
    assert.equal(record.messages.length, 0);
  });

  it('offers a restart when a setting that starts the server changes, and restarts on the click', async () => {
    const { clients } = await activate();
    record.button = 'Restart';
    changeSettings({ 'server.javaOptions': ['-Xmx256m'] });
    await settle();
    await settle();
    assert.match(record.messages[0].text, /settings that start the language server changed/);
    assert.equal(clients.length, 2);
    assert.equal(clients[0].stopped, true);
    assert.equal(clients[1].started, true);
    assert.deepEqual(clients[1].options.launch.args.slice(0, 2), ['-Xmx256m', '-Dfile.encoding=UTF-8']);
    assert.equal(clients[0].notifications.length, 0);
  });

  it('leaves the server alone when the user does not ask for the restart', async () => {
    const { clients } = await activate();
    changeSettings({ 'server.useInstalledPlumb': true });
    await settle();
    assert.equal(clients.length, 1);
    assert.equal(clients[0].stopped, false);
  });
});

describe('restart command', () => {
  it('stops the server and starts a new one with the settings as they are now', async () => {
    const { clients } = await activate();
    record.settings.set('significantFigures', 8);
    await record.commands.get(COMMANDS.restartServer)!();
    assert.equal(clients.length, 2);
    assert.equal(clients[0].stopped, true);
    assert.equal(clients[1].started, true);
    assert.deepEqual(clients[1].options.initializationOptions, { significantFigures: 8 });
  });

  it('shows the log on command', async () => {
    const { output } = await activate();
    await record.commands.get(COMMANDS.showServerLog)!();
    assert.equal(output.shown, 1);
  });
});

describe('show a value in another unit', () => {
  const showInLbf = {
    title: 'Show F in lbf', kind: 'refactor.rewrite',
    edit: { changes: { 'file:///work/calcs/pod.plumb': [{ range: { start: { line: 4, character: 20 }, end: { line: 4, character: 22 } }, newText: 'lbf' }] } },
  };
  const actions = [
    { title: 'Write `2 * d` for `2 d`', kind: 'quickfix', edit: { changes: {} } },
    { title: 'Show F in SI (N)', kind: 'refactor.rewrite', edit: { changes: {} } },
    showInLbf,
  ];

  it('asks the server for its refactors at the cursor and applies the unit picked', async () => {
    const { clients } = await activate(host(), (c) => c.answers.set('textDocument/codeAction', actions));
    record.activeTextEditor = calcEditor(4, 3);
    record.pick = 'Show F in lbf';
    await record.commands.get(COMMANDS.showValueInUnit)!();
    assert.deepEqual(clients[0].requests, [{
      method: 'textDocument/codeAction',
      params: {
        textDocument: { uri: 'file:///work/calcs/pod.plumb' },
        range: { start: { line: 4, character: 3 }, end: { line: 4, character: 3 } },
        context: { diagnostics: [], only: ['refactor.rewrite'], triggerKind: 1 },
      },
    }]);
    assert.deepEqual(record.quickPicks[0].labels, ['Show F in SI (N)', 'Show F in lbf']);
    assert.equal(record.applied.length, 1);
    assert.deepEqual(record.applied[0].entries, [showInLbf.edit]);
  });

  it('applies nothing when the user closes the list', async () => {
    await activate(host(), (c) => c.answers.set('textDocument/codeAction', actions));
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.showValueInUnit)!();
    assert.equal(record.quickPicks.length, 1);
    assert.equal(record.applied.length, 0);
  });

  it('applies nothing when the calc changed while the list was open', async () => {
    await activate(host(), (c) => c.answers.set('textDocument/codeAction', actions));
    const editor = calcEditor();
    record.activeTextEditor = editor;
    record.pick = 'Show F in lbf';
    const picking = record.commands.get(COMMANDS.showValueInUnit)!() as Promise<void>;
    editor.document.version++;
    await picking;
    assert.equal(record.applied.length, 0);
    assert.match(record.messages[0].text, /the calc changed while the list was open/);
  });

  it('says so when the server offers no unit at the cursor', async () => {
    await activate(host(), (c) => c.answers.set('textDocument/codeAction', [actions[0]]));
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.showValueInUnit)!();
    assert.equal(record.quickPicks.length, 0);
    assert.match(record.messages[0].text, /there is no value to show in another unit here/);
  });

  it('asks for a calc when the active editor holds something else', async () => {
    const { clients } = await activate();
    record.activeTextEditor = { ...calcEditor(), document: { ...calcEditor().document, languageId: 'markdown' } };
    await record.commands.get(COMMANDS.showValueInUnit)!();
    assert.equal(clients[0].requests.length, 0);
    assert.equal(record.messages[0].text, 'Plumb: open a calc (a .plumb file) first.');
  });

  it('refuses in words when the server offers no code actions', async () => {
    const { clients } = await activate(host(), (c) => {
      c.caps = { executeCommandProvider: { commands: [WRITE_REPORT] } };
    });
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.showValueInUnit)!();
    assert.equal(clients[0].requests.length, 0);
    assert.match(record.messages[0].text, /does not offer to show a value in another unit/);
  });
});

describe('the report', () => {
  const written = {
    uri: 'file:///work/calcs/pod.html', path: '/work/calcs/pod.html', beside: true,
    message: 'Wrote the report of pod.plumb beside it: /work/calcs/pod.html',
  };

  it('has the server write it from the editor\'s text and opens it in the browser', async () => {
    const { clients, output } = await activate(host(), (c) => c.answers.set('workspace/executeCommand', written));
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.openReport)!();
    assert.deepEqual(clients[0].requests, [{
      method: 'workspace/executeCommand',
      params: { command: 'plumb.writeReport', arguments: ['file:///work/calcs/pod.plumb'] },
    }]);
    assert.deepEqual(record.openedExternally.map((u) => u.fsPath), ['/work/calcs/pod.html']);
    assert.equal(record.messages[0].text, `Plumb: ${written.message}`);
    assert.ok(output.lines.includes(`info ${written.message}`));
  });

  it('opens it in an editor tab, or not at all, as plumb.report.open says', async () => {
    await activate(host(), (c) => c.answers.set('workspace/executeCommand', written));
    record.activeTextEditor = calcEditor();
    record.settings.set('report.open', 'editor');
    await record.commands.get(COMMANDS.openReport)!();
    assert.deepEqual(record.shownDocuments.map((u) => u.fsPath), ['/work/calcs/pod.html']);
    record.settings.set('report.open', 'none');
    await record.commands.get(COMMANDS.openReport)!();
    assert.equal(record.shownDocuments.length, 1);
    assert.equal(record.openedExternally.length, 0);
    assert.equal(record.messages.length, 2);
  });

  it('says where the report is when no browser opens it', async () => {
    await activate(host(), (c) => c.answers.set('workspace/executeCommand', written));
    record.activeTextEditor = calcEditor();
    record.openExternalResult = false;
    await record.commands.get(COMMANDS.openReport)!();
    assert.equal(record.messages[0].level, 'warning');
    assert.match(record.messages[0].text, /\/work\/calcs\/pod\.html \(no browser could open it\)/);
  });

  it('shows the server\'s refusal as it said it', async () => {
    const refusal = Object.assign(new Error('plumb.writeReport needs the URI of an open calc'), { code: -32602 });
    await activate(host(), (c) => c.answers.set('workspace/executeCommand', refusal));
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.openReport)!();
    assert.deepEqual(record.messages, [{ level: 'error', text: 'Plumb: plumb.writeReport needs the URI of an open calc', buttons: [] }]);
    assert.equal(record.openedExternally.length, 0);
  });

  it('refuses in words when the server does not offer the report', async () => {
    const { clients } = await activate(host(), (c) => {
      c.caps = { codeActionProvider: true, executeCommandProvider: { commands: ['plumb.showValue'] } };
    });
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.openReport)!();
    assert.equal(clients[0].requests.length, 0);
    assert.match(record.messages[0].text, /does not offer to write the report/);
  });

  it('says the server is not running rather than failing', async () => {
    await activate(host([JAR]));
    record.messages.length = 0;
    record.activeTextEditor = calcEditor();
    await record.commands.get(COMMANDS.openReport)!();
    assert.match(record.messages[0].text, /the language server is not running, so it cannot write the report/);
  });
});

describe('deactivation', () => {
  it('stops the server and removes the commands', async () => {
    const { controller, clients } = await activate();
    await controller.deactivate();
    controller.dispose();
    assert.equal(clients[0].stopped, true);
    assert.equal(record.commands.size, 0);
  });
});
