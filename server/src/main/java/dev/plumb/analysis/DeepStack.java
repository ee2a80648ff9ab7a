package dev.plumb.analysis;

import java.util.concurrent.ThreadFactory;
import java.util.function.Supplier;

/**
 * Runs analysis on threads with a large stack. The parser and evaluator recurse as deeply as an
 * expression nests (bounded by the syntax layer's limits), which a default 512 KB–1 MB thread
 * stack cannot always hold; callers of the engine need not care which thread they are on.
 */
final class DeepStack {
    static final long STACK_BYTES = 256L * 1024 * 1024;
    private static final ThreadLocal<Boolean> DEEP = ThreadLocal.withInitial(() -> false);

    /** Threads for pools that run analyses. */
    static final ThreadFactory FACTORY = r -> {
        Thread t = new Thread(null, () -> {
            DEEP.set(true);
            r.run();
        }, "plumb-analysis", STACK_BYTES);
        t.setDaemon(true);
        return t;
    };

    private DeepStack() {
    }

    /** Calls {@code work} on this thread when its stack is deep already, else on a fresh deep one. */
    static <T> T call(Supplier<T> work) {
        if (DEEP.get()) return work.get();
        Object[] result = new Object[1];
        Throwable[] failure = new Throwable[1];
        Thread t = FACTORY.newThread(() -> {
            try {
                result[0] = work.get();
            } catch (Throwable e) {
                failure[0] = e;
            }
        });
        t.start();
        try {
            t.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while analysing", e);
        }
        if (failure[0] instanceof RuntimeException re) throw re;
        if (failure[0] instanceof Error err) throw err;
        @SuppressWarnings("unchecked")
        T value = (T) result[0];
        return value;
    }
}
