// The editor's `plumb.*` settings, mapped to what the language server reads (its initialization
// options, its answer to workspace/configuration for the section "plumb", and
// workspace/didChangeConfiguration). No editor API here: the mapping is plain data, tested in node.

/** Reads one setting below `plumb`, as the editor's configuration object does (`get('debounceMs')`). */
export interface SettingsReader {
  get<T>(key: string): T | undefined;
}

/** How values are shown: the server's choice from what the editor can show, or one channel. */
export const VALUE_DISPLAYS = ['auto', 'inlayHints', 'codeLens', 'diagnostics'] as const;
export type ValueDisplay = (typeof VALUE_DISPLAYS)[number];

/** The keys the server reads (editor-clients/README.md, "Server settings"). */
export interface ServerSettings {
  significantFigures?: number;
  criticalReynolds?: number;
  debounceMs?: number;
  diagnosticsOnSaveOnly?: boolean;
  maxFileBytes?: number;
  monteCarloSamples?: number;
  monteCarloSeed?: number;
  inlayHints?: boolean;
  codeLens?: boolean;
  valueDiagnostics?: boolean;
}

/** The settings of this extension that the server reads; a change to one is sent to the running server. */
export const SERVER_SETTING_KEYS = [
  'significantFigures',
  'criticalReynolds',
  'showValuesAs',
  'debounceMs',
  'evaluateOnSaveOnly',
  'maxFileBytes',
  'monteCarloSamples',
  'monteCarloSeed',
] as const;

/** The settings that say how the server is started; a change to one needs a restart. */
export const LAUNCH_SETTING_KEYS = [
  'server.java',
  'server.javaOptions',
  'server.jar',
  'server.useInstalledPlumb',
] as const;

/**
 * The server settings for the editor's settings. A setting of the wrong type is left out, so the
 * server keeps its own default; the server also clamps numbers to its own limits. `showValuesAs`
 * "auto" sends no channel at all: the server then picks inlay hints, which this editor shows.
 */
export function serverSettings(settings: SettingsReader): ServerSettings {
  const out: ServerSettings = {};
  const digits = wholeNumber(settings.get('significantFigures'));
  if (digits !== undefined) out.significantFigures = digits;
  const reynolds = settings.get<unknown>('criticalReynolds');
  if (typeof reynolds === 'number' && Number.isFinite(reynolds) && reynolds > 0) out.criticalReynolds = reynolds;
  const debounce = wholeNumber(settings.get('debounceMs'));
  if (debounce !== undefined) out.debounceMs = debounce;
  const onSave = settings.get<unknown>('evaluateOnSaveOnly');
  if (typeof onSave === 'boolean') out.diagnosticsOnSaveOnly = onSave;
  const maxBytes = wholeNumber(settings.get('maxFileBytes'));
  if (maxBytes !== undefined) out.maxFileBytes = maxBytes;
  const samples = wholeNumber(settings.get('monteCarloSamples'));
  if (samples !== undefined) out.monteCarloSamples = samples;
  const seed = wholeNumber(settings.get('monteCarloSeed'));
  if (seed !== undefined) out.monteCarloSeed = seed;
  const display = settings.get<unknown>('showValuesAs');
  switch (display) {
    case 'inlayHints':
      Object.assign(out, { inlayHints: true, codeLens: false, valueDiagnostics: false });
      break;
    case 'codeLens':
      Object.assign(out, { inlayHints: false, codeLens: true, valueDiagnostics: false });
      break;
    case 'diagnostics':
      Object.assign(out, { inlayHints: false, codeLens: false, valueDiagnostics: true });
      break;
    default:
      break;
  }
  return out;
}

/**
 * The answer to the server's workspace/configuration request: the server settings for each item
 * of the section "plumb", null for any other section (this extension has no other settings to
 * give).
 */
export function configurationAnswer(items: ReadonlyArray<{ section?: string }>, settings: () => ServerSettings): Array<ServerSettings | null> {
  return items.map((item) => (item.section === 'plumb' ? settings() : null));
}

function wholeNumber(value: unknown): number | undefined {
  return typeof value === 'number' && Number.isFinite(value) ? Math.round(value) : undefined;
}

/** The launch settings, read with their types checked (a wrong type reads as the default). */
export interface LaunchSettings {
  /** The Java executable: a path, or a command looked up on the PATH; empty: JAVA_HOME, then `java`. */
  java: string;
  /** Options put before `-jar`, such as the heap size. */
  javaOptions: string[];
  /** The server jar; empty: the one bundled in the extension. */
  jar: string;
  /** Run `plumb lsp` with the `plumb` found on the PATH instead of Java and a jar. */
  useInstalledPlumb: boolean;
}

export const DEFAULT_JAVA_OPTIONS = ['-Xmx1g'];

export function launchSettings(settings: SettingsReader): LaunchSettings {
  const java = settings.get<unknown>('server.java');
  const options = settings.get<unknown>('server.javaOptions');
  const jar = settings.get<unknown>('server.jar');
  const installed = settings.get<unknown>('server.useInstalledPlumb');
  return {
    java: typeof java === 'string' ? java.trim() : '',
    javaOptions: Array.isArray(options) && options.every((o) => typeof o === 'string')
      ? options.filter((o: string) => o.trim() !== '')
      : [...DEFAULT_JAVA_OPTIONS],
    jar: typeof jar === 'string' ? jar.trim() : '',
    useInstalledPlumb: installed === true,
  };
}

/** Where the report opens after it is written. */
export type ReportOpening = 'browser' | 'editor' | 'none';

export function reportOpening(settings: SettingsReader): ReportOpening {
  const value = settings.get<unknown>('report.open');
  return value === 'editor' || value === 'none' ? value : 'browser';
}
