// The packaged extension (PLUMB_VSIX=path/to/plumb-VERSION.vsix, as .ci/run sets it): what the
// package holds and leaves out, and — unpacked — that its own compiled code loads with the
// dependencies packed beside it, finds the jar packed with it, and that jar serves the extension's
// whole exchange with the server (test/server/session.ts). Skipped without PLUMB_VSIX.

import { permissive } from './stub/vscode';
import * as assert from 'node:assert/strict';
import * as cp from 'child_process';
import * as crypto from 'crypto';
import * as fs from 'fs';
import { after, before, describe, it } from 'node:test';
import * as os from 'os';
import * as path from 'path';
import { exerciseServer, launchFrom } from './server/session';

const EXTENSION = path.resolve(__dirname, '..', '..');
const REPOSITORY = path.resolve(EXTENSION, '..', '..');
const vsix = process.env.PLUMB_VSIX;

describe('the .vsix', { skip: vsix ? false : 'no package given (PLUMB_VSIX)' }, () => {
  let entries: string[] = [];
  let unpacked = '';

  before(() => {
    entries = cp.execFileSync('unzip', ['-Z1', vsix!], { encoding: 'utf8' }).split('\n').filter((e) => e !== '');
    unpacked = fs.mkdtempSync(path.join(os.tmpdir(), 'plumb-vsix-'));
    cp.execFileSync('unzip', ['-q', vsix!, '-d', unpacked]);
  });
  after(() => {
    if (unpacked) fs.rmSync(unpacked, { recursive: true, force: true });
  });

  it('holds the manifest, compiled code, grammar, language configuration, jar, readme and licence', () => {
    for (const name of ['extension.vsixmanifest', 'extension/package.json', 'extension/readme.md', 'extension/LICENSE.txt',
      'extension/language-configuration.json', 'extension/syntaxes/plumb.tmLanguage.json', 'extension/server/plumb.jar',
      ...['extension', 'client', 'controller', 'launch', 'protocol', 'settings'].map((m) => `extension/out/src/${m}.js`)]) {
      assert.ok(entries.includes(name), `${name} is missing`);
    }
  });

  it('leaves out sources, tests, source maps and build tools', () => {
    const stray = entries.filter((e) => /^extension\/(src|test|scripts|dist|out\/test)\//.test(e)
      || /\.(map|ts)$/.test(e) || /^extension\/(tsconfig\.json|\.gitignore|\.vscodeignore)$/.test(e));
    assert.deepEqual(stray, []);
  });

  it('packs exactly the production dependencies of the lock file', () => {
    const lock = JSON.parse(fs.readFileSync(path.join(EXTENSION, 'package-lock.json'), 'utf8'));
    const production = Object.entries(lock.packages as Record<string, { dev?: boolean }>)
      .filter(([key, p]) => key.startsWith('node_modules/') && !p.dev)
      .map(([key]) => key).sort();
    // A package's folder: node_modules/NAME or node_modules/@SCOPE/NAME, maybe inside another package's node_modules.
    const packageJson = /^extension\/((?:node_modules\/(?:@[^/]+\/)?[^/]+\/)*node_modules\/(?:@[^/]+\/)?[^/]+)\/package\.json$/;
    const packed = entries.map((e) => packageJson.exec(e)?.[1]).filter((d): d is string => d !== undefined).sort();
    assert.deepEqual(packed, production);
    assert.ok(production.includes('node_modules/vscode-languageclient'));
  });

  it('carries the server jar the build made', () => {
    const built = process.env.PLUMB_JAR ?? path.join(REPOSITORY, 'server', 'target', 'plumb.jar');
    const digest = (f: string) => crypto.createHash('sha256').update(fs.readFileSync(f)).digest('hex');
    assert.equal(digest(path.join(unpacked, 'extension', 'server', 'plumb.jar')), digest(built));
  });

  it('loads its compiled code with the dependencies packed beside it', () => {
    permissive();
    const client = require(path.join(unpacked, 'extension', 'out', 'src', 'client.js'));
    assert.equal(typeof client.createClient, 'function');
    const extension = require(path.join(unpacked, 'extension', 'out', 'src', 'extension.js'));
    assert.equal(typeof extension.activate, 'function');
    assert.equal(typeof extension.deactivate, 'function');
  });

  it('starts its own jar and serves the whole exchange', { timeout: 120000 }, async () => {
    const packedLaunch = require(path.join(unpacked, 'extension', 'out', 'src', 'launch.js'));
    const home = path.join(unpacked, 'extension');
    const resolution = packedLaunch.resolveLaunch(
      { java: '', javaOptions: ['-Xmx1g'], jar: '', useInstalledPlumb: false },
      { platform: process.platform, env: process.env, extensionPath: home, homeDir: os.homedir(),
        isFile: (f: string) => fs.existsSync(f) && fs.statSync(f).isFile() });
    assert.ok(resolution.ok, resolution.problem);
    assert.ok(resolution.launch.args.includes(path.join(home, 'server', 'plumb.jar')), resolution.launch.description);
    assert.deepEqual(launchFrom(home), resolution);
    await exerciseServer(resolution.launch);
  });
});
