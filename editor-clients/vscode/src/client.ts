// The language client: vscode-languageclient started with the command the settings resolved to.
// Documents: *.plumb files on disk (the server reads used files from the workspace). The server's
// log (its stderr) and the client's own messages go to one output channel.

import * as vscode from 'vscode';
import { LanguageClient, type LanguageClientOptions, type ServerOptions } from 'vscode-languageclient/node';
import type { ClientFactory, PlumbClient } from './controller';
import { configurationAnswer } from './settings';

export const CLIENT_ID = 'plumb';
export const CLIENT_NAME = 'Plumb Language Server';

export const createClient: ClientFactory = (options) => {
  const { launch } = options;
  const server: ServerOptions = {
    command: launch.command,
    args: launch.args,
    // The client hands these options to the process as they are: the environment must be whole.
    options: { env: { ...process.env, ...launch.env }, ...(launch.shell ? { shell: true } : {}) },
  };
  const clientOptions: LanguageClientOptions = {
    documentSelector: [{ scheme: 'file', language: 'plumb' }],
    initializationOptions: options.initializationOptions,
    outputChannel: options.output,
    middleware: {
      workspace: {
        // The server asks for the section "plumb": answer with the settings mapped to its keys.
        configuration: (params, token, next) => {
          if (params.items.every((item) => item.section !== 'plumb')) return next(params, token);
          return configurationAnswer(params.items, options.configuration);
        },
      },
    },
  };
  const client = new LanguageClient(CLIENT_ID, CLIENT_NAME, server, clientOptions);
  const plumb: PlumbClient = {
    start: () => client.start(),
    stop: () => (client.needsStop() ? client.stop() : Promise.resolve()),
    capabilities: () => client.initializeResult?.capabilities,
    serverInfo: () => client.initializeResult?.serverInfo,
    sendRequest: (method, params) => client.sendRequest(method, params),
    sendNotification: (method, params) => client.sendNotification(method, params),
    uriOf: (uri: vscode.Uri) => client.code2ProtocolConverter.asUri(uri),
    workspaceEdit: async (edit) => (await client.protocol2CodeConverter.asWorkspaceEdit(edit)) ?? new vscode.WorkspaceEdit(),
  };
  return plumb;
};
