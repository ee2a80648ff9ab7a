// The extension's wiring: starts the language server from the settings, forwards setting changes,
// restarts it on command, and runs the commands that use the server (a value in another unit, the
// report). The language client itself comes from a factory (client.ts), so this file is tested in
// node with a stand-in `vscode` module and a stand-in client.

import * as vscode from 'vscode';
import type { ServerCapabilities, WorkspaceEdit } from 'vscode-languageserver-protocol';
import { resolveLaunch, type Host, type ServerLaunch } from './launch';
import { NOTHING_OFFERED, offersOf, readReportAnswer, REWRITE, unitChoices, WRITE_REPORT, type Offers } from './protocol';
import {
  LAUNCH_SETTING_KEYS, launchSettings, reportOpening, SERVER_SETTING_KEYS, serverSettings, type ServerSettings,
} from './settings';

/** The extension's own commands (package.json lists the same; the server's commands have other ids). */
export const COMMANDS = {
  showValueInUnit: 'plumb.showValueInUnit',
  openReport: 'plumb.openReport',
  restartServer: 'plumb.restartServer',
  showServerLog: 'plumb.showServerLog',
} as const;

/** Context keys for `when` clauses: a command is listed only while the running server offers it. */
export const CONTEXT_KEYS = {
  running: 'plumb.serverRunning',
  offersReport: 'plumb.serverOffersReport',
  offersUnits: 'plumb.serverOffersUnits',
} as const;

/** The part of the language client this file uses. */
export interface PlumbClient {
  start(): Promise<void>;
  stop(): Promise<void>;
  capabilities(): ServerCapabilities | undefined;
  /** The server's name and version from its answer to initialize, for the log. */
  serverInfo(): { name: string; version?: string } | undefined;
  sendRequest(method: string, params: unknown): Promise<unknown>;
  sendNotification(method: string, params: unknown): Promise<void>;
  /** A document's URI as the client sent it to the server. */
  uriOf(uri: vscode.Uri): string;
  /** A protocol edit as an editor edit. */
  workspaceEdit(edit: WorkspaceEdit): Promise<vscode.WorkspaceEdit>;
}

export interface ClientOptions {
  launch: ServerLaunch;
  /** Sent with initialize. */
  initializationOptions: ServerSettings;
  /** The answer to the server's workspace/configuration request for the section "plumb". */
  configuration(): ServerSettings;
  output: vscode.LogOutputChannel;
}

export type ClientFactory = (options: ClientOptions) => PlumbClient;

export class Controller implements vscode.Disposable {
  private client: PlumbClient | undefined;
  private offers: Offers = NOTHING_OFFERED;
  /** Starts and restarts run one after another. */
  private queue: Promise<void> = Promise.resolve();
  private readonly disposables: vscode.Disposable[] = [];

  constructor(
    private readonly host: Host,
    private readonly factory: ClientFactory,
    readonly output: vscode.LogOutputChannel,
  ) {}

  /** Registers the commands and the settings listener, and starts the server. */
  activate(): Promise<void> {
    this.disposables.push(
      vscode.commands.registerCommand(COMMANDS.showValueInUnit, () => this.showValueInUnit()),
      vscode.commands.registerCommand(COMMANDS.openReport, () => this.openReport()),
      vscode.commands.registerCommand(COMMANDS.restartServer, () => this.restart()),
      vscode.commands.registerCommand(COMMANDS.showServerLog, () => this.output.show(true)),
      vscode.workspace.onDidChangeConfiguration((e) => this.settingsChanged(e)),
    );
    return this.enqueue(() => this.start());
  }

  /** Stops the server (when the editor closes or the extension is turned off). */
  async deactivate(): Promise<void> {
    await this.enqueue(() => this.stop());
  }

  dispose(): void {
    for (const d of this.disposables.splice(0)) d.dispose();
  }

  /** Stops the running server and starts one again, with the settings as they are now. */
  restart(): Promise<void> {
    return this.enqueue(async () => {
      this.output.info('Restarting the language server.');
      await this.stop();
      await this.start();
    });
  }

  private enqueue(step: () => Promise<void>): Promise<void> {
    this.queue = this.queue.then(step, step);
    return this.queue;
  }

  private async start(): Promise<void> {
    const settings = vscode.workspace.getConfiguration('plumb');
    const resolution = resolveLaunch(launchSettings(settings), this.host);
    if (!resolution.ok) {
      this.output.error(resolution.problem);
      void vscode.window.showErrorMessage(`Plumb: ${resolution.problem}`, 'Open Settings', 'Show Log').then((choice) => {
        if (choice === 'Open Settings') void vscode.commands.executeCommand('workbench.action.openSettings', 'plumb.server');
        if (choice === 'Show Log') this.output.show(true);
      });
      await this.setOffers(NOTHING_OFFERED, false);
      return;
    }
    const { launch } = resolution;
    this.output.info(`Starting the language server: ${launch.description}`);
    const client = this.factory({
      launch,
      initializationOptions: serverSettings(settings),
      configuration: () => serverSettings(vscode.workspace.getConfiguration('plumb')),
      output: this.output,
    });
    try {
      await client.start();
    } catch (e) {
      this.output.error(`The language server did not start: ${messageOf(e)}`);
      void vscode.window.showErrorMessage(
        `Plumb: the language server did not start (${messageOf(e)}). It needs Java 17 or later; the log says more.`,
        'Show Log',
      ).then((choice) => {
        if (choice === 'Show Log') this.output.show(true);
      });
      // A client that failed to start may still hold a process: stop it, and forget it.
      await client.stop().catch(() => undefined);
      await this.setOffers(NOTHING_OFFERED, false);
      return;
    }
    this.client = client;
    const info = client.serverInfo();
    this.output.info(`The language server is running${info ? ` (${info.name}${info.version ? ' ' + info.version : ''})` : ''}.`);
    await this.setOffers(offersOf(client.capabilities()), true);
  }

  private async stop(): Promise<void> {
    const client = this.client;
    this.client = undefined;
    await this.setOffers(NOTHING_OFFERED, false);
    if (!client) return;
    try {
      await client.stop();
    } catch (e) {
      this.output.warn(`The language server did not stop cleanly: ${messageOf(e)}`);
    }
  }

  private async setOffers(offers: Offers, running: boolean): Promise<void> {
    this.offers = offers;
    await vscode.commands.executeCommand('setContext', CONTEXT_KEYS.running, running);
    await vscode.commands.executeCommand('setContext', CONTEXT_KEYS.offersReport, offers.writeReport);
    await vscode.commands.executeCommand('setContext', CONTEXT_KEYS.offersUnits, offers.showInUnit);
  }

  /** Server settings go to the running server at once; settings that start it ask for a restart. */
  private settingsChanged(e: vscode.ConfigurationChangeEvent): void {
    if (LAUNCH_SETTING_KEYS.some((k) => e.affectsConfiguration(`plumb.${k}`))) {
      void vscode.window.showInformationMessage(
        'Plumb: the settings that start the language server changed. Restart it now?', 'Restart',
      ).then((choice) => {
        if (choice === 'Restart') void this.restart();
      });
    }
    const client = this.client;
    if (client && SERVER_SETTING_KEYS.some((k) => e.affectsConfiguration(`plumb.${k}`))) {
      const settings = serverSettings(vscode.workspace.getConfiguration('plumb'));
      client.sendNotification('workspace/didChangeConfiguration', { settings: { plumb: settings } }).catch((err) => {
        this.output.warn(`The new settings did not reach the language server: ${messageOf(err)}`);
      });
    }
  }

  /** The calc in the active editor, or undefined after saying what to do. */
  private activeCalc(): vscode.TextEditor | undefined {
    const editor = vscode.window.activeTextEditor;
    if (!editor || editor.document.languageId !== 'plumb') {
      void vscode.window.showInformationMessage('Plumb: open a calc (a .plumb file) first.');
      return undefined;
    }
    return editor;
  }

  /** The running client when the server offers what a command needs, or undefined after saying why not. */
  private clientFor(offer: keyof Offers, what: string): PlumbClient | undefined {
    if (!this.client) {
      void vscode.window.showErrorMessage(`Plumb: the language server is not running, so it cannot ${what}. `
        + 'Run "Plumb: Restart Language Server", or see "Plumb: Show Language Server Log".');
      return undefined;
    }
    if (!this.offers[offer]) {
      void vscode.window.showErrorMessage(`Plumb: this language server does not offer to ${what}; a newer Plumb does.`);
      return undefined;
    }
    return this.client;
  }

  /** Lists the server's "Show NAME in UNIT" refactors for the value at the cursor and applies the one picked. */
  async showValueInUnit(): Promise<void> {
    const editor = this.activeCalc();
    if (!editor) return;
    const client = this.clientFor('showInUnit', 'show a value in another unit');
    if (!client) return;
    const document = editor.document;
    const version = document.version;
    const at = { line: editor.selection.active.line, character: editor.selection.active.character };
    let actions: unknown;
    try {
      actions = await client.sendRequest('textDocument/codeAction', {
        textDocument: { uri: client.uriOf(document.uri) },
        range: { start: at, end: at },
        context: { diagnostics: [], only: [REWRITE], triggerKind: 1 },
      });
    } catch (e) {
      void vscode.window.showErrorMessage(`Plumb: ${messageOf(e)}`);
      return;
    }
    const choices = unitChoices(Array.isArray(actions) ? actions : []);
    if (choices.length === 0) {
      void vscode.window.showInformationMessage('Plumb: there is no value to show in another unit here. '
        + 'Put the cursor on a definition whose value is known and has a unit.');
      return;
    }
    const picked = await vscode.window.showQuickPick(
      choices.map((choice) => ({ label: choice.title, choice })),
      { placeHolder: 'Show the value in another unit (sets the definition\'s "in UNIT")' },
    );
    if (!picked) return;
    if (document.version !== version) {
      void vscode.window.showInformationMessage('Plumb: the calc changed while the list was open; run the command again.');
      return;
    }
    const applied = await vscode.workspace.applyEdit(await client.workspaceEdit(picked.choice.edit));
    if (!applied) void vscode.window.showErrorMessage('Plumb: the editor did not apply the change.');
  }

  /** Has the server write the printable report of the calc as it is in the editor, then opens it. */
  async openReport(): Promise<void> {
    const editor = this.activeCalc();
    if (!editor) return;
    const client = this.clientFor('writeReport', 'write the report');
    if (!client) return;
    let answer: unknown;
    try {
      answer = await client.sendRequest('workspace/executeCommand', {
        command: WRITE_REPORT,
        arguments: [client.uriOf(editor.document.uri)],
      });
    } catch (e) {
      void vscode.window.showErrorMessage(`Plumb: ${messageOf(e)}`);
      return;
    }
    const read = readReportAnswer(answer);
    if (!read.ok) {
      void vscode.window.showErrorMessage(`Plumb: ${read.problem}.`);
      return;
    }
    const report = read.report;
    this.output.info(report.message);
    const file = vscode.Uri.file(report.path);
    const opening = reportOpening(vscode.workspace.getConfiguration('plumb'));
    if (opening === 'browser') {
      const opened = await vscode.env.openExternal(file);
      if (!opened) void vscode.window.showWarningMessage(`Plumb: ${report.message} (no browser could open it).`);
      else void vscode.window.showInformationMessage(`Plumb: ${report.message}`);
    } else if (opening === 'editor') {
      await vscode.window.showTextDocument(file);
      void vscode.window.showInformationMessage(`Plumb: ${report.message}`);
    } else {
      void vscode.window.showInformationMessage(`Plumb: ${report.message}`);
    }
  }
}

function messageOf(e: unknown): string {
  if (e instanceof Error) return e.message;
  if (typeof e === 'object' && e !== null && typeof (e as { message?: unknown }).message === 'string') {
    return (e as { message: string }).message;
  }
  return String(e);
}
