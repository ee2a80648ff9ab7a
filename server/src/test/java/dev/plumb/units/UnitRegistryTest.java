package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The shared registry: one instance, cached results, safe from several threads. */
class UnitRegistryTest {

    @Test
    void oneSharedRegistry() {
        assertSame(UnitRegistry.standard(), UnitRegistry.standard());
    }

    @Test
    void resultsAreCached() {
        UnitRegistry units = UnitRegistry.standard();
        assertSame(units.resolve("W/(m^2*K)"), units.resolve("W/(m^2*K)"));
    }

    @Test
    void symbolsListAtomsForCompletion() {
        Set<String> symbols = UnitRegistry.standard().symbols();
        for (String s : new String[] {"m", "kg", "kPa", "°C", "degC", "psi", "slug", "µm", "um"}) {
            assertTrue(symbols.contains(s), s);
        }
        assertFalse(symbols.contains("kg/m^3"));
        assertThrows(UnsupportedOperationException.class, () -> symbols.add("x"));
    }

    @Test
    void concurrentResolvesAgree() throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Double>> futures = new ArrayList<>();
            for (int i = 0; i < 200; i++) {
                String expression = "kg/m^" + (i % 7);
                Callable<Double> task = () -> ((UnitResult.Ok) UnitRegistry.standard()
                        .resolve(expression)).unit().factor();
                futures.add(pool.submit(task));
            }
            for (Future<Double> f : futures) {
                assertTrue(f.get() == 1.0);
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
