package dev.plumb.lsp;

import java.util.function.Function;
import org.eclipse.lsp4j.jsonrpc.Endpoint;
import org.eclipse.lsp4j.jsonrpc.MessageConsumer;
import org.eclipse.lsp4j.jsonrpc.RemoteEndpoint;
import org.eclipse.lsp4j.jsonrpc.messages.NotificationMessage;
import org.eclipse.lsp4j.jsonrpc.messages.RequestMessage;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;

/**
 * The protocol's lifecycle, kept in one place for every message: before `initialize` a request
 * gets ServerNotInitialized (-32002) and a notification is dropped; `initialize` is answered
 * once; after `shutdown` a request gets InvalidRequest and a notification other than `exit` is
 * dropped. A request without params is refused with InvalidParams before any handler runs, so
 * no handler meets a null it did not expect.
 */
final class LifecycleEndpoint extends RemoteEndpoint {
    private enum State { NEW, RUNNING, SHUT_DOWN }

    private final MessageConsumer out;
    private final Endpoint local;
    private final java.io.PrintStream log;
    private State state = State.NEW;

    LifecycleEndpoint(MessageConsumer out, Endpoint local, Function<Throwable, ResponseError> exceptionHandler,
                      java.io.PrintStream log) {
        super(out, local, exceptionHandler);
        this.out = out;
        this.local = local;
        this.log = log;
    }

    @Override
    protected void handleRequest(RequestMessage request) {
        ResponseError refusal = refusal(request);
        if (refusal != null) {
            out.consume(createErrorResponseMessage(request, refusal));
            return;
        }
        super.handleRequest(request);
    }

    /** Why a request is not handed to the server, or null. Messages arrive on one thread, in order. */
    private synchronized ResponseError refusal(RequestMessage request) {
        String method = request.getMethod();
        boolean initialize = "initialize".equals(method);
        if (state == State.SHUT_DOWN) {
            return new ResponseError(ResponseErrorCode.InvalidRequest, "the server is shutting down: send exit", null);
        }
        if (state == State.NEW && !initialize) {
            return new ResponseError(ResponseErrorCode.ServerNotInitialized,
                "the server is not initialized: send initialize first", null);
        }
        if (state == State.RUNNING && initialize) {
            return new ResponseError(ResponseErrorCode.InvalidRequest, "initialize was already received", null);
        }
        if (request.getParams() == null && !"shutdown".equals(method)) {
            return new ResponseError(ResponseErrorCode.InvalidParams, method + " needs params", null);
        }
        if (initialize) state = State.RUNNING;
        if ("shutdown".equals(method)) state = State.SHUT_DOWN;
        return null;
    }

    @Override
    protected void handleNotification(NotificationMessage notification) {
        String method = notification.getMethod();
        synchronized (this) {
            boolean exit = "exit".equals(method);
            if (!exit && state != State.RUNNING) return;
            if (!exit && notification.getParams() == null && !"initialized".equals(method)) return;
        }
        if (handleCancellation(notification)) return;
        try {
            local.notify(method, notification.getParams());
        } catch (RuntimeException e) {
            // A notification has no answer: one line on stderr, not the library's stack trace.
            log.println("plumb lsp: could not handle " + method + ": " + e);
        }
    }
}
