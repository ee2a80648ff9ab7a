// The editor's settings → what the server reads, and the launch settings read with their types.

import * as assert from 'node:assert/strict';
import { describe, it } from 'node:test';
import { configurationAnswer, launchSettings, reportOpening, serverSettings, type SettingsReader } from '../src/settings';

function reader(values: Record<string, unknown>): SettingsReader {
  return { get: <T>(key: string) => values[key] as T | undefined };
}

/** The defaults of package.json, as the editor merges them into every read. */
const DEFAULTS = {
  significantFigures: 4, criticalReynolds: null, showValuesAs: 'auto', debounceMs: 100,
  evaluateOnSaveOnly: false, maxFileBytes: 2097152, monteCarloSamples: 0, monteCarloSeed: 20261202,
};

describe('server settings', () => {
  it('sends the defaults under the server\'s own keys, with no Reynolds number and no value channel', () => {
    assert.deepEqual(serverSettings(reader(DEFAULTS)), {
      significantFigures: 4, debounceMs: 100, diagnosticsOnSaveOnly: false, maxFileBytes: 2097152,
      monteCarloSamples: 0, monteCarloSeed: 20261202,
    });
  });

  it('sends a critical Reynolds number only when it is a positive number', () => {
    assert.equal(serverSettings(reader({ criticalReynolds: 3e5 })).criticalReynolds, 3e5);
    for (const bad of [0, -1, null, '3e5', Number.POSITIVE_INFINITY, Number.NaN]) {
      assert.equal('criticalReynolds' in serverSettings(reader({ criticalReynolds: bad })), false, String(bad));
    }
  });

  it('maps where values are shown to the three channels the server knows', () => {
    assert.deepEqual(serverSettings(reader({ showValuesAs: 'inlayHints' })),
      { inlayHints: true, codeLens: false, valueDiagnostics: false });
    assert.deepEqual(serverSettings(reader({ showValuesAs: 'codeLens' })),
      { inlayHints: false, codeLens: true, valueDiagnostics: false });
    assert.deepEqual(serverSettings(reader({ showValuesAs: 'diagnostics' })),
      { inlayHints: false, codeLens: false, valueDiagnostics: true });
    assert.deepEqual(serverSettings(reader({ showValuesAs: 'auto' })), {});
    assert.deepEqual(serverSettings(reader({ showValuesAs: 'everywhere' })), {});
  });

  it('rounds whole-number settings and leaves out values of the wrong type', () => {
    assert.deepEqual(serverSettings(reader({ significantFigures: 5.6, debounceMs: 249.5, maxFileBytes: 4096 })),
      { significantFigures: 6, debounceMs: 250, maxFileBytes: 4096 });
    assert.deepEqual(serverSettings(reader({ significantFigures: '5', debounceMs: true, evaluateOnSaveOnly: 'yes' })), {});
  });

  it('sends "evaluate on save only" as the server\'s diagnosticsOnSaveOnly', () => {
    assert.deepEqual(serverSettings(reader({ evaluateOnSaveOnly: true })), { diagnosticsOnSaveOnly: true });
  });
});

describe('the answer to workspace/configuration', () => {
  it('gives the server settings for the section plumb and nothing for another', () => {
    let asked = 0;
    const settings = () => {
      asked++;
      return { significantFigures: 5 };
    };
    assert.deepEqual(configurationAnswer([{ section: 'plumb' }, { section: 'editor' }, {}], settings),
      [{ significantFigures: 5 }, null, null]);
    assert.equal(asked, 1);
  });
});

describe('launch settings', () => {
  it('reads the defaults', () => {
    assert.deepEqual(launchSettings(reader({ 'server.java': '', 'server.javaOptions': ['-Xmx1g'], 'server.jar': '',
      'server.useInstalledPlumb': false })), { java: '', javaOptions: ['-Xmx1g'], jar: '', useInstalledPlumb: false });
  });

  it('trims paths, drops empty Java options and reads a wrong type as the default', () => {
    assert.deepEqual(launchSettings(reader({ 'server.java': ' /opt/jdk/bin/java ', 'server.javaOptions': ['-Xmx256m', ' ', '-XX:+UseSerialGC'],
      'server.jar': '~/plumb.jar ', 'server.useInstalledPlumb': 'true' })),
    { java: '/opt/jdk/bin/java', javaOptions: ['-Xmx256m', '-XX:+UseSerialGC'], jar: '~/plumb.jar', useInstalledPlumb: false });
    assert.deepEqual(launchSettings(reader({ 'server.javaOptions': '-Xmx2g' })).javaOptions, ['-Xmx1g']);
    assert.deepEqual(launchSettings(reader({ 'server.javaOptions': [] })).javaOptions, []);
  });

  it('reads where the report opens, the browser unless told otherwise', () => {
    assert.equal(reportOpening(reader({})), 'browser');
    assert.equal(reportOpening(reader({ 'report.open': 'editor' })), 'editor');
    assert.equal(reportOpening(reader({ 'report.open': 'none' })), 'none');
    assert.equal(reportOpening(reader({ 'report.open': 'printer' })), 'browser');
  });
});
