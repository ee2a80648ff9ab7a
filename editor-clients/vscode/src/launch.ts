// How the language server is started: Java with the server jar (the one bundled in the extension
// unless a setting names another), or an installed `plumb` on the PATH. Plain data in, plain data
// out: the file system and the environment come in as a Host, so every case is tested in node.

import * as path from 'path';
import type { LaunchSettings } from './settings';

/** What the resolution may look at. */
export interface Host {
  platform: NodeJS.Platform;
  env: Record<string, string | undefined>;
  /** The extension's own folder (holds server/plumb.jar in a packaged extension). */
  extensionPath: string;
  homeDir: string;
  /** Whether a regular file exists at this absolute path. */
  isFile(file: string): boolean;
}

/** A command that starts `plumb lsp` over stdin/stdout. */
export interface ServerLaunch {
  command: string;
  args: string[];
  /** Variables added to the editor's environment for the server. */
  env: Record<string, string>;
  /** For the log: what runs, in words. */
  description: string;
  /** Windows runs a .cmd or .bat launcher only through its shell. */
  shell?: boolean;
}

export type Resolution = { ok: true; launch: ServerLaunch } | { ok: false; problem: string };

/** Where a packaged extension carries the server jar (copied in when the .vsix is made). */
export const BUNDLED_JAR = 'server/plumb.jar';
/** The jar a build of the repository makes, seen from editor-clients/vscode (running from a clone). */
export const REPOSITORY_JAR = '../../server/target/plumb.jar';

/** Paths as the host's platform writes them. */
function pathsOf(host: Host): path.PlatformPath {
  return host.platform === 'win32' ? path.win32 : path.posix;
}

export function resolveLaunch(settings: LaunchSettings, host: Host): Resolution {
  const env = localeFix(host);
  if (settings.useInstalledPlumb) {
    const plumb = findOnPath('plumb', host);
    if (!plumb) {
      return {
        ok: false,
        problem: 'plumb.server.useInstalledPlumb is on, but no `plumb` command is on the PATH '
          + `(${pathOf(host.env) || 'PATH is empty'}). Install Plumb's launcher there, or turn the setting off `
          + 'to use the server jar bundled with the extension.',
      };
    }
    const shell = host.platform === 'win32' && /\.(cmd|bat)$/i.test(plumb);
    if (shell) {
      return { ok: true, launch: { command: `"${plumb}"`, args: ['lsp'], env, description: `${plumb} lsp`, shell } };
    }
    return { ok: true, launch: { command: plumb, args: ['lsp'], env, description: `${plumb} lsp` } };
  }
  const jar = findJar(settings.jar, host);
  if (!jar.ok) return jar;
  const java = findJava(settings.java, host);
  if (!java.ok) return java;
  // Calc files and their names are UTF-8 whatever the platform's default (see the repository's ./plumb).
  const args = [...settings.javaOptions, '-Dfile.encoding=UTF-8', '-jar', jar.file, 'lsp'];
  return { ok: true, launch: { command: java.file, args, env, description: [java.file, ...args].join(' ') } };
}

/** The server jar: the setting's (absolute, or starting with ~), the bundled one, or a repository build's. */
export function findJar(setting: string, host: Host): { ok: true; file: string } | { ok: false; problem: string } {
  const path = pathsOf(host);
  if (setting !== '') {
    const file = expandHome(setting, host);
    if (!path.isAbsolute(file)) {
      return { ok: false, problem: `plumb.server.jar must be an absolute path (it is "${setting}").` };
    }
    if (!host.isFile(file)) {
      return { ok: false, problem: `plumb.server.jar names ${file}, which is not a file. Build the server `
        + '(`mvn -B verify` in the repository makes server/target/plumb.jar) or clear the setting to use the bundled jar.' };
    }
    return { ok: true, file };
  }
  for (const candidate of [BUNDLED_JAR, REPOSITORY_JAR]) {
    const file = path.resolve(host.extensionPath, candidate);
    if (host.isFile(file)) return { ok: true, file };
  }
  return {
    ok: false,
    problem: `This copy of the extension carries no server jar (looked for ${path.resolve(host.extensionPath, BUNDLED_JAR)}). `
      + 'Set plumb.server.jar to a plumb.jar, or turn on plumb.server.useInstalledPlumb to use `plumb` on the PATH.',
  };
}

/** The Java executable: the setting (a path, or a command on the PATH), JAVA_HOME's, or `java` on the PATH. */
export function findJava(setting: string, host: Host): { ok: true; file: string } | { ok: false; problem: string } {
  const path = pathsOf(host);
  const exe = host.platform === 'win32' ? 'java.exe' : 'java';
  if (setting !== '') {
    const given = expandHome(setting, host);
    if (given.includes('/') || given.includes('\\')) {
      const file = path.resolve(given);
      if (host.isFile(file)) return { ok: true, file };
      return { ok: false, problem: `plumb.server.java names ${file}, which is not a file. Point it at a Java 17 (or later) executable.` };
    }
    const found = findOnPath(given, host);
    if (found) return { ok: true, file: found };
    return { ok: false, problem: `plumb.server.java is "${setting}", and no such command is on the PATH.` };
  }
  const javaHome = envValue(host.env, 'JAVA_HOME');
  if (javaHome) {
    const file = path.join(javaHome, 'bin', exe);
    if (host.isFile(file)) return { ok: true, file };
  }
  const found = findOnPath('java', host);
  if (found) return { ok: true, file: found };
  return {
    ok: false,
    problem: 'No Java found: the Plumb language server needs Java 17 or later. Install it, '
      + 'or set plumb.server.java to its executable (or JAVA_HOME to its folder).',
  };
}

/** The first file named `name` (with the PATHEXT endings on Windows) in the PATH's folders. */
export function findOnPath(name: string, host: Host): string | undefined {
  const path = pathsOf(host);
  const windows = host.platform === 'win32';
  const separator = windows ? ';' : ':';
  const endings = windows
    ? ['', ...(envValue(host.env, 'PATHEXT') || '.COM;.EXE;.BAT;.CMD').split(';').filter((e) => e !== '')]
    : [''];
  for (const dir of pathOf(host.env).split(separator)) {
    if (dir === '') continue;
    for (const ending of endings) {
      const file = path.join(dir, name + ending);
      if (host.isFile(file)) return file;
    }
  }
  return undefined;
}

/**
 * On Linux, Java fixes the encoding of file names from the locale when it starts; under a locale
 * that is not UTF-8 a calc named `ρ.plumb` could not be opened. Start the server under C.UTF-8 then.
 */
function localeFix(host: Host): Record<string, string> {
  if (host.platform !== 'linux') return {};
  const locale = envValue(host.env, 'LC_ALL') || envValue(host.env, 'LC_CTYPE') || envValue(host.env, 'LANG') || '';
  return /utf-?8/i.test(locale) ? {} : { LC_ALL: 'C.UTF-8' };
}

function expandHome(file: string, host: Host): string {
  if (file === '~') return host.homeDir;
  if (file.startsWith('~/') || file.startsWith('~\\')) return pathsOf(host).join(host.homeDir, file.slice(2));
  return file;
}

/** Environment variables are case-insensitive on Windows (`Path`). */
function envValue(env: Record<string, string | undefined>, name: string): string | undefined {
  if (env[name] !== undefined) return env[name];
  const key = Object.keys(env).find((k) => k.toUpperCase() === name);
  return key === undefined ? undefined : env[key];
}

function pathOf(env: Record<string, string | undefined>): string {
  return envValue(env, 'PATH') || '';
}
