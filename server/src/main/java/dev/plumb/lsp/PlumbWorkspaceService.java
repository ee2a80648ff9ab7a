package dev.plumb.lsp;

import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DidChangeWatchedFilesParams;
import org.eclipse.lsp4j.services.WorkspaceService;

/** Settings and files changed outside the editor: analyse the open documents again. */
final class PlumbWorkspaceService implements WorkspaceService {
    private final PlumbLanguageServer server;

    PlumbWorkspaceService(PlumbLanguageServer server) {
        this.server = server;
    }

    @Override
    public void didChangeConfiguration(DidChangeConfigurationParams params) {
        server.updateSettings(params.getSettings());
        server.analyses().scheduleAll();
    }

    @Override
    public void didChangeWatchedFiles(DidChangeWatchedFilesParams params) {
        server.analyses().scheduleAll();
    }
}
