package dev.plumb.lsp;

import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.util.concurrent.CompletionException;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.jsonrpc.MessageConsumer;
import org.eclipse.lsp4j.jsonrpc.RemoteEndpoint;
import org.eclipse.lsp4j.jsonrpc.json.MessageJsonHandler;
import org.eclipse.lsp4j.jsonrpc.json.StreamMessageConsumer;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.services.ServiceEndpoints;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;

/**
 * Connects the server to a client's streams: framing checked ({@link FramedInput}), the
 * lifecycle enforced ({@link LifecycleEndpoint}), and a failure inside a handler answered with a
 * short message and no stack trace, which would otherwise travel to the client in the error's
 * data.
 */
final class PlumbLauncher {
    private PlumbLauncher() {
    }

    static Launcher<LanguageClient> create(PlumbLanguageServer server, InputStream in, OutputStream out, PrintStream log) {
        Launcher<LanguageClient> launcher = new LSPLauncher.Builder<LanguageClient>() {
            @Override
            protected RemoteEndpoint createRemoteEndpoint(MessageJsonHandler jsonHandler) {
                MessageConsumer outgoing = wrapMessageConsumer(new StreamMessageConsumer(output, jsonHandler));
                RemoteEndpoint endpoint = new LifecycleEndpoint(outgoing, ServiceEndpoints.toEndpoint(localServices),
                    exceptionHandler, log);
                jsonHandler.setMethodProvider(endpoint);
                endpoint.setJsonHandler(jsonHandler);
                return endpoint;
            }
        }
            .setLocalService(server)
            .setRemoteInterface(LanguageClient.class)
            .setInput(new FramedInput(in, log))
            .setOutput(out)
            .setExceptionHandler(PlumbLauncher::error)
            .create();
        server.connect(launcher.getRemoteProxy());
        return launcher;
    }

    /** A handler's failure as the client sees it: what went wrong in a sentence, no trace. */
    static ResponseError error(Throwable t) {
        while ((t instanceof CompletionException || t instanceof java.util.concurrent.ExecutionException) && t.getCause() != null) {
            t = t.getCause();
        }
        if (t instanceof ResponseErrorException r) return r.getResponseError();
        if (t instanceof OutOfMemoryError) {
            return new ResponseError(ResponseErrorCode.RequestFailed, "Plumb ran out of memory answering this request: "
                + "the calc is too large for the memory Plumb was given (see the editor set-up for -Xmx)", null);
        }
        System.err.println("plumb lsp: a request failed: " + t);
        return new ResponseError(ResponseErrorCode.InternalError,
            "Plumb could not answer this request (" + t.getClass().getSimpleName() + "); please report it with the file", null);
    }
}
