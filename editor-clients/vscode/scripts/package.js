// Makes dist/plumb-VERSION.vsix (or PLUMB_VSIX_DIR/plumb-VERSION.vsix), the installable extension:
// compiles the TypeScript, copies the server jar (server/target/plumb.jar of the repository, or
// PLUMB_JAR) and the repository's licence in, packages with vsce, which adds the production
// dependencies (npm ci must have run), and removes the copies again. Prints the file's path.
'use strict';
const { execFileSync } = require('child_process');
const fs = require('fs');
const path = require('path');

const here = path.resolve(__dirname, '..');
const repository = path.resolve(here, '..', '..');
const jar = process.env.PLUMB_JAR || path.join(repository, 'server', 'target', 'plumb.jar');
if (!fs.existsSync(jar)) {
  console.error(`package: no server jar at ${jar}; build it first (mvn -B verify in ${repository})`);
  process.exit(2);
}
const out = path.resolve(process.env.PLUMB_VSIX_DIR || path.join(here, 'dist'));
const version = require(path.join(here, 'package.json')).version;
const vsix = path.join(out, `plumb-${version}.vsix`);
// The tools run by node itself, so this works wherever node does (no shell, no npx).
const run = (tool, args) => execFileSync(process.execPath, [path.join(here, 'node_modules', ...tool), ...args],
  { cwd: here, stdio: ['ignore', process.stderr, process.stderr] });

const copies = [path.join(here, 'server'), path.join(here, 'LICENSE')];
try {
  run(['typescript', 'bin', 'tsc'], ['-p', '.']);
  fs.rmSync(copies[0], { recursive: true, force: true });
  fs.mkdirSync(copies[0]);
  fs.mkdirSync(out, { recursive: true });
  fs.copyFileSync(jar, path.join(copies[0], 'plumb.jar'));
  fs.copyFileSync(path.join(repository, 'LICENSE'), copies[1]);
  run(['@vscode', 'vsce', 'vsce'], ['package', '--allow-missing-repository', '--out', vsix]);
} finally {
  for (const copy of copies) fs.rmSync(copy, { recursive: true, force: true });
}
console.log(vsix);
