// package.json's contributions against the code and the docs: the commands the extension
// registers, the menus' conditions, the language and its configuration, the grammar, and the
// settings (each read by the code, the server's defaults as editor-clients/README.md lists them).

import { record, reset, logChannel } from './stub/vscode';
import * as assert from 'node:assert/strict';
import * as fs from 'fs';
import { describe, it } from 'node:test';
import * as path from 'path';
import { COMMANDS, CONTEXT_KEYS, Controller } from '../src/controller';
import { SHOW_VALUE, WRITE_REPORT } from '../src/protocol';
import { LAUNCH_SETTING_KEYS, SERVER_SETTING_KEYS, serverSettings, VALUE_DISPLAYS } from '../src/settings';

const EXTENSION = path.resolve(__dirname, '..', '..');
const pkg = JSON.parse(fs.readFileSync(path.join(EXTENSION, 'package.json'), 'utf8'));
const contributes = pkg.contributes;
const properties: Record<string, { default: unknown; scope?: string; enum?: string[]; type: unknown }> =
  contributes.configuration.properties;

interface Command { command: string; title: string; category: string }
interface MenuItem { command: string; when?: string }

describe('package.json', () => {
  it('points at the compiled entry point and activates on a calc', () => {
    assert.equal(pkg.main, './out/src/extension.js');
    assert.ok(fs.existsSync(path.join(EXTENSION, pkg.main)), `${pkg.main} is missing: run tsc first`);
    assert.deepEqual(pkg.activationEvents, ['onLanguage:plumb']);
  });

  it('asks for an editor no older than the API it is compiled against', () => {
    const engine = /^\^(\d+)\.(\d+)\.\d+$/.exec(pkg.engines.vscode);
    const types = /^(\d+)\.(\d+)\.\d+$/.exec(pkg.devDependencies['@types/vscode']);
    assert.ok(engine && types, `${pkg.engines.vscode} / ${pkg.devDependencies['@types/vscode']}`);
    assert.deepEqual(types.slice(1, 3), engine.slice(1, 3));
  });

  it('lists exactly the commands the extension registers, each with a title in the Plumb category', async () => {
    reset();
    await new Controller({ platform: 'linux', env: {}, extensionPath: '/x', homeDir: '/h', isFile: () => false },
      () => { throw new Error('no server in this test'); }, logChannel() as never).activate();
    const listed = (contributes.commands as Command[]).map((c) => c.command).sort();
    assert.deepEqual(listed, [...record.commands.keys()].sort());
    assert.deepEqual(listed, Object.values(COMMANDS).sort());
    for (const c of contributes.commands as Command[]) {
      assert.equal(c.category, 'Plumb', c.command);
      assert.ok(c.title.length > 5, c.command);
    }
    // The language client registers the server's own commands under their ids.
    const ids = new Set<string>((contributes.commands as Command[]).map((c) => c.command));
    assert.ok(!ids.has(WRITE_REPORT) && !ids.has(SHOW_VALUE));
  });

  it('shows the server-dependent commands only in calcs and only while the server offers them', () => {
    const known = new Set((contributes.commands as Command[]).map((c) => c.command));
    const keys = new Set(Object.values(CONTEXT_KEYS));
    for (const [menu, items] of Object.entries(contributes.menus as Record<string, MenuItem[]>)) {
      for (const item of items) {
        assert.ok(known.has(item.command), `${menu}: ${item.command} is not a command`);
        for (const key of (item.when ?? '').match(/plumb\.[A-Za-z.]+/g) ?? []) {
          assert.ok(keys.has(key as never), `${menu}: ${key} is no context key the extension sets`);
        }
      }
    }
    const palette = contributes.menus.commandPalette as MenuItem[];
    const when = (command: string) => palette.find((m) => m.command === command)?.when;
    assert.equal(when(COMMANDS.openReport), `editorLangId == plumb && ${CONTEXT_KEYS.offersReport}`);
    assert.equal(when(COMMANDS.showValueInUnit), `editorLangId == plumb && ${CONTEXT_KEYS.offersUnits}`);
  });

  it('declares the language for *.plumb with its configuration and the grammar', () => {
    assert.deepEqual(contributes.languages.map((l: { id: string; extensions: string[] }) => [l.id, l.extensions]),
      [['plumb', ['.plumb']]]);
    const config = path.join(EXTENSION, contributes.languages[0].configuration);
    assert.ok(fs.existsSync(config));
    assert.equal(contributes.grammars.length, 1);
    const grammar = contributes.grammars[0];
    assert.equal(grammar.language, 'plumb');
    const file = JSON.parse(fs.readFileSync(path.join(EXTENSION, grammar.path), 'utf8'));
    assert.equal(file.scopeName, grammar.scopeName);
    assert.equal(grammar.scopeName, 'source.plumb');
  });

  it('has a setting for every key the code reads, and no other', () => {
    const read = [...SERVER_SETTING_KEYS, ...LAUNCH_SETTING_KEYS, 'report.open', 'trace.server'].map((k) => `plumb.${k}`);
    assert.deepEqual(Object.keys(properties).sort(), read.sort());
    for (const [key, p] of Object.entries(properties)) {
      assert.ok('default' in p, `${key} has no default`);
      assert.ok((p as { markdownDescription?: string }).markdownDescription, `${key} has no description`);
    }
    assert.deepEqual(properties['plumb.showValuesAs'].enum, [...VALUE_DISPLAYS]);
  });

  it('is documented: the README names every setting and every command', () => {
    const readme = fs.readFileSync(path.join(EXTENSION, 'README.md'), 'utf8');
    for (const key of Object.keys(properties)) assert.ok(readme.includes(`\`${key}\``), `README lacks ${key}`);
    for (const c of contributes.commands as Command[]) {
      assert.ok(readme.includes(`**Plumb: ${c.title}**`), `README lacks the command "Plumb: ${c.title}"`);
    }
  });

  it('lets only the user, never a workspace, say which program starts the server', () => {
    for (const key of LAUNCH_SETTING_KEYS) assert.equal(properties[`plumb.${key}`].scope, 'machine', key);
    for (const key of SERVER_SETTING_KEYS) assert.notEqual(properties[`plumb.${key}`].scope, 'machine', key);
  });

  it('sends the server its own defaults, and every server setting the docs list can be set', () => {
    // The server's settings table in editor-clients/README.md: | `key` | default | meaning |
    const readme = fs.readFileSync(path.join(EXTENSION, '..', 'README.md'), 'utf8');
    const table = new Map<string, string>();
    for (const m of readme.matchAll(/^\| `([A-Za-z]+)` \| ([^|]+) \|/gm)) table.set(m[1], m[2].trim());
    assert.ok(table.size >= 8, `found ${table.size} settings in editor-clients/README.md`);
    const defaults = Object.fromEntries(Object.entries(properties).map(([k, p]) => [k.slice('plumb.'.length), p.default]));
    const sent = serverSettings({ get: <T>(k: string) => defaults[k] as T });
    for (const [key, value] of Object.entries(sent)) {
      assert.ok(table.has(key), `the extension sends ${key}, which the server's table does not list`);
      const documented = table.get(key)!.split(' ')[0];
      assert.equal(String(value), documented, `${key}: the extension sends ${value}, the server's default is ${documented}`);
    }
    const reachable = new Set<string>(Object.keys(sent));
    for (const display of VALUE_DISPLAYS) {
      Object.keys(serverSettings({ get: <T>(k: string) => (k === 'showValuesAs' ? display : defaults[k]) as T })).forEach((k) => reachable.add(k));
    }
    Object.keys(serverSettings({ get: <T>(k: string) => (k === 'criticalReynolds' ? 3e5 : defaults[k]) as T })).forEach((k) => reachable.add(k));
    assert.deepEqual([...reachable].sort(), [...table.keys()].sort());
  });
});

describe('language configuration', () => {
  const config = JSON.parse(fs.readFileSync(path.join(EXTENSION, 'language-configuration.json'), 'utf8'));
  const regex = (r: string | { pattern: string; flags?: string }) =>
    typeof r === 'string' ? new RegExp(r) : new RegExp(r.pattern, r.flags);

  it('comments with #, pairs brackets and closes quotes outside strings', () => {
    assert.equal(config.comments.lineComment, '#');
    assert.deepEqual(config.brackets, [['(', ')'], ['[', ']']]);
    assert.deepEqual(config.autoClosingPairs.find((p: { open: string }) => p.open === '"').notIn, ['string', 'comment']);
  });

  it('takes a whole name, Unicode letters included, as a word', () => {
    const word = regex(config.wordPattern);
    assert.equal('ρ_air2 + 1'.match(word)?.[0], 'ρ_air2');
    assert.equal('Δp_loss*2'.match(word)?.[0], 'Δp_loss');
  });

  it('indents inside correlation … end and table … end', () => {
    const increase = regex(config.indentationRules.increaseIndentPattern);
    const decrease = regex(config.indentationRules.decreaseIndentPattern);
    for (const head of ['correlation cd_strut(Re)', 'table water(T: temperature)', '  correlation f(x)  # note']) {
      assert.ok(increase.test(head), head);
    }
    for (const other of ['table = 3', 'correlation(x) = 2 * x', 'tables = 2', 'input V = 3 m/s']) {
      assert.ok(!increase.test(other), other);
    }
    for (const end of ['end', '  end', 'end   # done']) assert.ok(decrease.test(end), end);
    for (const other of ['end_x = 1', 'end = 2', 'endurance = 3']) assert.ok(!decrease.test(other), other);
  });

  it('folds blocks from their head to end', () => {
    const start = regex(config.folding.markers.start);
    const end = regex(config.folding.markers.end);
    assert.ok(start.test('correlation cd_strut(Re)') && start.test('table water(T)'));
    assert.ok(!start.test('table = 3'));
    assert.ok(end.test('end') && !end.test('end_x = 1'));
  });
});
