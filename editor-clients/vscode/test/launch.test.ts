// Which command starts the server: Java and the jar (the setting's, the bundled one, a repository
// build's), or `plumb` on the PATH; and what the user is told when something is missing.

import * as assert from 'node:assert/strict';
import { describe, it } from 'node:test';
import * as path from 'path';
import { findJar, findJava, findOnPath, resolveLaunch, type Host } from '../src/launch';
import type { LaunchSettings } from '../src/settings';

const EXT = '/home/eng/.editor/extensions/plumb-0.1.0';
const BUNDLED = path.posix.join(EXT, 'server', 'plumb.jar');

function host(files: string[], env: Record<string, string | undefined> = { PATH: '/usr/bin:/bin', LANG: 'C.UTF-8' },
  platform: NodeJS.Platform = 'linux', extensionPath = EXT): Host {
  return { platform, env, extensionPath, homeDir: '/home/eng', isFile: (f) => files.includes(f) };
}

const DEFAULTS: LaunchSettings = { java: '', javaOptions: ['-Xmx1g'], jar: '', useInstalledPlumb: false };

describe('the server command', () => {
  it('runs the bundled jar with java from the PATH', () => {
    const r = resolveLaunch(DEFAULTS, host(['/usr/bin/java', BUNDLED]));
    assert.deepEqual(r, { ok: true, launch: {
      command: '/usr/bin/java', args: ['-Xmx1g', '-Dfile.encoding=UTF-8', '-jar', BUNDLED, 'lsp'], env: {},
      description: `/usr/bin/java -Xmx1g -Dfile.encoding=UTF-8 -jar ${BUNDLED} lsp`,
    } });
  });

  it('runs `plumb lsp` from the PATH when asked, and ignores Java and the jar then', () => {
    const r = resolveLaunch({ ...DEFAULTS, useInstalledPlumb: true, jar: '/nowhere.jar' },
      host(['/opt/plumb/bin/plumb'], { PATH: '/usr/bin:/opt/plumb/bin', LANG: 'en_US.UTF-8' }));
    assert.ok(r.ok);
    assert.equal(r.launch.command, '/opt/plumb/bin/plumb');
    assert.deepEqual(r.launch.args, ['lsp']);
  });

  it('says where it looked when `plumb` is not on the PATH', () => {
    const r = resolveLaunch({ ...DEFAULTS, useInstalledPlumb: true }, host(['/usr/bin/java', BUNDLED]));
    assert.deepEqual(r, { ok: false, problem: 'plumb.server.useInstalledPlumb is on, but no `plumb` command is on the PATH '
      + '(/usr/bin:/bin). Install Plumb\'s launcher there, or turn the setting off to use the server jar bundled with the extension.' });
  });

  it('runs a Windows launcher script through the shell, quoted', () => {
    const r = resolveLaunch({ ...DEFAULTS, useInstalledPlumb: true }, host(['C:\\Plumb\\bin\\plumb.CMD'],
      { Path: 'C:\\Windows;C:\\Plumb\\bin', PATHEXT: '.EXE;.CMD' }, 'win32'));
    assert.ok(r.ok);
    assert.equal(r.launch.command, '"C:\\Plumb\\bin\\plumb.CMD"');
    assert.equal(r.launch.shell, true);
  });

  it('starts Java under C.UTF-8 on Linux when the locale is not UTF-8, so calc names such as ρ.plumb open', () => {
    const files = ['/usr/bin/java', BUNDLED];
    for (const env of [{ PATH: '/usr/bin', LANG: 'C' }, { PATH: '/usr/bin' }, { PATH: '/usr/bin', LANG: 'en_GB.UTF-8', LC_ALL: 'POSIX' }]) {
      const r = resolveLaunch(DEFAULTS, host(files, env));
      assert.ok(r.ok);
      assert.deepEqual(r.launch.env, { LC_ALL: 'C.UTF-8' }, JSON.stringify(env));
    }
    for (const env of [{ PATH: '/usr/bin', LC_ALL: 'en_GB.utf8' }, { PATH: '/usr/bin', LC_CTYPE: 'de_DE.UTF-8' }]) {
      const r = resolveLaunch(DEFAULTS, host(files, env));
      assert.ok(r.ok);
      assert.deepEqual(r.launch.env, {}, JSON.stringify(env));
    }
    const mac = resolveLaunch(DEFAULTS, host(files, { PATH: '/usr/bin', LANG: 'C' }, 'darwin'));
    assert.ok(mac.ok);
    assert.deepEqual(mac.launch.env, {});
  });

  it('puts the Java options first, before -jar', () => {
    const r = resolveLaunch({ ...DEFAULTS, javaOptions: ['-Xmx128m', '-XX:+UseSerialGC'] }, host(['/usr/bin/java', BUNDLED]));
    assert.ok(r.ok);
    assert.deepEqual(r.launch.args, ['-Xmx128m', '-XX:+UseSerialGC', '-Dfile.encoding=UTF-8', '-jar', BUNDLED, 'lsp']);
  });
});

describe('the jar', () => {
  it('takes the bundled jar, else a repository build beside the extension\'s folder', () => {
    assert.deepEqual(findJar('', host([BUNDLED])), { ok: true, file: BUNDLED });
    const checkout = '/src/plumb/editor-clients/vscode';
    assert.deepEqual(findJar('', host(['/src/plumb/server/target/plumb.jar'], {}, 'linux', checkout)),
      { ok: true, file: '/src/plumb/server/target/plumb.jar' });
    assert.deepEqual(findJar('', host([BUNDLED, '/home/eng/.editor/server/target/plumb.jar'])), { ok: true, file: BUNDLED });
  });

  it('takes the setting\'s jar, with ~ for the home folder', () => {
    assert.deepEqual(findJar('~/tools/plumb.jar', host(['/home/eng/tools/plumb.jar', BUNDLED])),
      { ok: true, file: '/home/eng/tools/plumb.jar' });
    assert.deepEqual(findJar('/opt/plumb/plumb.jar', host(['/opt/plumb/plumb.jar'])), { ok: true, file: '/opt/plumb/plumb.jar' });
  });

  it('refuses a relative or missing jar in words', () => {
    assert.deepEqual(findJar('plumb.jar', host([BUNDLED])),
      { ok: false, problem: 'plumb.server.jar must be an absolute path (it is "plumb.jar").' });
    const missing = findJar('/opt/plumb/plumb.jar', host([BUNDLED]));
    assert.ok(!missing.ok);
    assert.match(missing.problem, /^plumb\.server\.jar names \/opt\/plumb\/plumb\.jar, which is not a file/);
  });

  it('says what to set when the extension carries no jar', () => {
    const r = findJar('', host([]));
    assert.ok(!r.ok);
    assert.match(r.problem, /carries no server jar \(looked for .*server\/plumb\.jar\)\. Set plumb\.server\.jar/);
  });
});

describe('java', () => {
  it('takes the setting, then JAVA_HOME, then the PATH', () => {
    const files = ['/opt/jdk-21/bin/java', '/usr/lib/jvm/java-17/bin/java', '/usr/bin/java'];
    const env = { PATH: '/usr/bin', JAVA_HOME: '/usr/lib/jvm/java-17' };
    assert.deepEqual(findJava('/opt/jdk-21/bin/java', host(files, env)), { ok: true, file: '/opt/jdk-21/bin/java' });
    assert.deepEqual(findJava('', host(files, env)), { ok: true, file: '/usr/lib/jvm/java-17/bin/java' });
    assert.deepEqual(findJava('', host(files, { PATH: '/usr/bin', JAVA_HOME: '/nowhere' })), { ok: true, file: '/usr/bin/java' });
  });

  it('looks a bare command name up on the PATH', () => {
    assert.deepEqual(findJava('java21', host(['/opt/bin/java21'], { PATH: '/usr/bin:/opt/bin' })), { ok: true, file: '/opt/bin/java21' });
    assert.deepEqual(findJava('java21', host([], { PATH: '/usr/bin' })),
      { ok: false, problem: 'plumb.server.java is "java21", and no such command is on the PATH.' });
  });

  it('names the setting when the given path is not a file, and says Java 17 is needed when there is none', () => {
    const r = findJava('/opt/jdk/bin/java', host([]));
    assert.ok(!r.ok);
    assert.match(r.problem, /^plumb\.server\.java names \/opt\/jdk\/bin\/java, which is not a file/);
    const none = findJava('', host([], { PATH: '/usr/bin' }));
    assert.ok(!none.ok);
    assert.match(none.problem, /^No Java found: the Plumb language server needs Java 17 or later/);
  });

  it('finds java.exe on Windows through JAVA_HOME or the PATH with its endings', () => {
    const javaHome = 'C:\\jdk17\\bin\\java.exe';
    assert.deepEqual(findJava('', host([javaHome], { Path: 'C:\\Windows', JAVA_HOME: 'C:\\jdk17' }, 'win32')),
      { ok: true, file: javaHome });
    const onPath = 'C:\\jdk17\\bin\\java.EXE';
    assert.deepEqual(findOnPath('java', host([onPath], { Path: 'C:\\Windows;C:\\jdk17\\bin', PATHEXT: '.COM;.EXE' }, 'win32')), onPath);
  });

  it('skips empty PATH entries', () => {
    assert.equal(findOnPath('java', host(['java'], { PATH: '::' })), undefined);
  });
});
