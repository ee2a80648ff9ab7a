package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
    void noSpellingHidesAPrefixedUnit() {
        // An exact spelling wins over a prefix split, so a new unit spelled like a prefix and a
        // prefixable unit ("Pm", "kWh" defined whole) would silently hide that reading.
        List<AtomDefinition> all = new ArrayList<>(LibraryUnits.all());
        all.addAll(TradeUnits.all());
        Set<String> exact = new java.util.HashSet<>();
        all.forEach(d -> exact.addAll(d.spellings()));
        List<String> hidden = new ArrayList<>();
        for (AtomDefinition d : all) {
            if (!d.prefixable()) {
                continue;
            }
            for (String base : d.spellings()) {
                for (SiPrefixes.Prefix p : SiPrefixes.all()) {
                    if (exact.contains(p.spelling() + base)) {
                        hidden.add(p.spelling() + base);
                    }
                }
            }
        }
        assertEquals(List.of(), hidden);
    }

    @Test
    void everyUnitHasAName() {
        List<AtomDefinition> all = new ArrayList<>(LibraryUnits.all());
        all.addAll(TradeUnits.all());
        for (AtomDefinition d : all) {
            assertFalse(d.unit().name().isBlank(), d.spellings().toString());
        }
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
