// The extension's launch, settings, refactor and report logic against the real server, started
// as the extension run from this repository starts it (the jar a build left in server/target).
// Needs Java 17 and the jar; without them the test is skipped, unless PLUMB_REQUIRE_SERVER=1 (CI).

import { describe, it } from 'node:test';
import * as path from 'path';
import { exerciseServer, launchFrom } from './server/session';

const EXTENSION = path.resolve(__dirname, '..', '..');

describe('against the real server', () => {
  const resolution = launchFrom(EXTENSION);
  const required = process.env.PLUMB_REQUIRE_SERVER === '1';
  const skip = !resolution.ok && !required ? `no server to run: ${resolution.problem}` : false;

  it('starts, takes the settings, offers the refactors and writes the report', { skip, timeout: 120000 }, async () => {
    if (!resolution.ok) throw new Error(resolution.problem);
    await exerciseServer(resolution.launch);
  });
});
