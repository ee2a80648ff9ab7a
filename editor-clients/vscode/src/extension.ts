// Entry point: the editor calls activate when a .plumb file opens or a Plumb command runs.

import * as fs from 'fs';
import * as os from 'os';
import * as vscode from 'vscode';
import { CLIENT_NAME, createClient } from './client';
import { Controller } from './controller';
import type { Host } from './launch';

let controller: Controller | undefined;

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  const output = vscode.window.createOutputChannel(CLIENT_NAME, { log: true });
  const host: Host = {
    platform: process.platform,
    env: process.env,
    extensionPath: context.extensionPath,
    homeDir: os.homedir(),
    isFile: (file) => {
      try {
        return fs.statSync(file).isFile();
      } catch {
        return false;
      }
    },
  };
  controller = new Controller(host, createClient, output);
  context.subscriptions.push(output, controller);
  await controller.activate();
}

export async function deactivate(): Promise<void> {
  await controller?.deactivate();
  controller = undefined;
}
