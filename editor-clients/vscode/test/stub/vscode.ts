// A stand-in for the editor's `vscode` module, for tests in plain node: the editor itself cannot
// run here. Importing this file makes `require('vscode')` return it. It records what the extension
// asked of the editor (commands registered, messages shown, edits applied, contexts set) and lets
// a test script the user's answers (the item picked, the button pressed) and the settings.

import Module = require('module');

type Listener<T> = (e: T) => void;

export class Disposable {
  constructor(private readonly onDispose: () => void = () => undefined) {}
  dispose(): void {
    this.onDispose();
  }
}

export class Uri {
  private constructor(readonly scheme: string, readonly path: string) {}
  static file(path: string): Uri {
    return new Uri('file', path);
  }
  static parse(value: string): Uri {
    const m = /^([a-z]+):\/\/(.*)$/.exec(value);
    return m ? new Uri(m[1], decodeURIComponent(m[2])) : new Uri('file', value);
  }
  get fsPath(): string {
    return this.path;
  }
  toString(): string {
    return `${this.scheme}://${encodeURI(this.path)}`;
  }
}

export class WorkspaceEdit {
  readonly entries: unknown[] = [];
}

export interface Message {
  level: 'info' | 'warning' | 'error';
  text: string;
  buttons: string[];
}

export interface FakeDocument {
  uri: Uri;
  languageId: string;
  version: number;
}

export interface FakeEditor {
  document: FakeDocument;
  selection: { active: { line: number; character: number } };
}

class LogChannel {
  readonly lines: string[] = [];
  shown = 0;
  info(text: string): void {
    this.lines.push(`info ${text}`);
  }
  warn(text: string): void {
    this.lines.push(`warn ${text}`);
  }
  error(text: string): void {
    this.lines.push(`error ${text}`);
  }
  show(): void {
    this.shown++;
  }
  dispose(): void {}
}

/** What the extension did, and what the next user answers are. Reset before each test. */
export const record = {
  commands: new Map<string, (...args: unknown[]) => unknown>(),
  executed: [] as Array<{ command: string; args: unknown[] }>,
  contexts: new Map<string, unknown>(),
  messages: [] as Message[],
  quickPicks: [] as Array<{ labels: string[]; placeHolder?: string }>,
  applied: [] as WorkspaceEdit[],
  openedExternally: [] as Uri[],
  shownDocuments: [] as Uri[],
  settings: new Map<string, unknown>(),
  configListeners: [] as Array<Listener<{ affectsConfiguration(section: string): boolean }>>,
  /** The label the user picks in the next quick pick (undefined: the user presses Escape). */
  pick: undefined as string | undefined,
  /** The button the user presses on the next message that has buttons. */
  button: undefined as string | undefined,
  openExternalResult: true,
  applyEditResult: true,
  activeTextEditor: undefined as FakeEditor | undefined,
};

export function reset(): void {
  record.commands.clear();
  record.executed.length = 0;
  record.contexts.clear();
  record.messages.length = 0;
  record.quickPicks.length = 0;
  record.applied.length = 0;
  record.openedExternally.length = 0;
  record.shownDocuments.length = 0;
  record.settings.clear();
  record.configListeners.length = 0;
  record.pick = undefined;
  record.button = undefined;
  record.openExternalResult = true;
  record.applyEditResult = true;
  record.activeTextEditor = undefined;
}

/** Changes settings (keys below `plumb`) and tells the listeners, as the settings editor does. */
export function changeSettings(values: Record<string, unknown>): void {
  for (const [k, v] of Object.entries(values)) record.settings.set(k, v);
  const changed = Object.keys(values).map((k) => `plumb.${k}`);
  const event = {
    affectsConfiguration: (section: string) => changed.some((c) => c === section || c.startsWith(section + '.')),
  };
  for (const l of record.configListeners) l(event);
}

function message(level: Message['level']) {
  return (text: string, ...buttons: string[]): Promise<string | undefined> => {
    record.messages.push({ level, text, buttons });
    return Promise.resolve(buttons.length > 0 && record.button !== undefined && buttons.includes(record.button)
      ? record.button : undefined);
  };
}

export const window = {
  get activeTextEditor(): FakeEditor | undefined {
    return record.activeTextEditor;
  },
  showInformationMessage: message('info'),
  showWarningMessage: message('warning'),
  showErrorMessage: message('error'),
  showQuickPick: <T extends { label: string }>(items: T[], options?: { placeHolder?: string }): Promise<T | undefined> => {
    record.quickPicks.push({ labels: items.map((i) => i.label), placeHolder: options?.placeHolder });
    return Promise.resolve(items.find((i) => i.label === record.pick));
  },
  showTextDocument: (uri: Uri): Promise<unknown> => {
    record.shownDocuments.push(uri);
    return Promise.resolve({});
  },
  createOutputChannel: (): LogChannel => new LogChannel(),
};

export const commands = {
  registerCommand: (id: string, run: (...args: unknown[]) => unknown): Disposable => {
    if (record.commands.has(id)) throw new Error(`command '${id}' already exists`);
    record.commands.set(id, run);
    return new Disposable(() => record.commands.delete(id));
  },
  executeCommand: (command: string, ...args: unknown[]): Promise<unknown> => {
    record.executed.push({ command, args });
    if (command === 'setContext') record.contexts.set(args[0] as string, args[1]);
    const own = record.commands.get(command);
    return Promise.resolve(own ? own(...args) : undefined);
  },
};

export const workspace = {
  getConfiguration: (section?: string) => {
    if (section !== 'plumb') throw new Error(`the extension read the settings section '${section}'`);
    return {
      get: <T>(key: string, fallback?: T): T | undefined =>
        (record.settings.has(key) ? record.settings.get(key) : fallback) as T | undefined,
    };
  },
  onDidChangeConfiguration: (listener: Listener<{ affectsConfiguration(section: string): boolean }>): Disposable => {
    record.configListeners.push(listener);
    return new Disposable(() => record.configListeners.splice(record.configListeners.indexOf(listener), 1));
  },
  applyEdit: (edit: WorkspaceEdit): Promise<boolean> => {
    record.applied.push(edit);
    return Promise.resolve(record.applyEditResult);
  },
};

export const env = {
  openExternal: (uri: Uri): Promise<boolean> => {
    record.openedExternally.push(uri);
    return Promise.resolve(record.openExternalResult);
  },
};

/** A log channel as window.createOutputChannel(name, { log: true }) makes it. */
export function logChannel(): LogChannel {
  return new LogChannel();
}

/**
 * From now on, a name this stand-in lacks reads as an empty class. Only for loading code that
 * subclasses the editor's classes when it loads (the language client library), never for a test
 * of what the extension does.
 */
export function permissive(): void {
  const cached = require.cache[__filename];
  if (!cached) throw new Error('the stand-in vscode module is not loaded');
  const real = cached.exports as Record<string | symbol, unknown>;
  cached.exports = new Proxy(real, {
    get: (target, key) => (key in target ? target[key] : class Missing {}),
  });
}

// `require('vscode')` anywhere in the process now returns this module.
const moduleWithResolver = Module as unknown as {
  _resolveFilename(request: string, ...rest: unknown[]): string;
};
const resolve = moduleWithResolver._resolveFilename;
moduleWithResolver._resolveFilename = function (request: string, ...rest: unknown[]): string {
  if (request === 'vscode') return __filename;
  return resolve.call(this, request, ...rest);
};
