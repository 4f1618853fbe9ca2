package org.hobwright.api.spi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URL;
import java.util.Enumeration;
import java.util.List;
import java.util.stream.Collectors;
import org.hobwright.api.cycle.HobCycle;
import org.junit.jupiter.api.Test;

class ProvidersTest {

    /** Serves the test's own service files under fake-services/ as if they were META-INF/services/. */
    static final class FakeServicesLoader extends ClassLoader {
        FakeServicesLoader() {
            super(ProvidersTest.class.getClassLoader());
        }

        @Override
        public Enumeration<URL> getResources(String name) throws IOException {
            if (name.startsWith("META-INF/services/")) {
                return getParent().getResources("fake-services/" + name.substring("META-INF/services/".length()));
            }
            return super.getResources(name);
        }
    }

    /** A writer that works. */
    public static final class GoodWriter implements CycleWriter {
        @Override
        public String id() {
            return "good";
        }

        @Override
        public int spiVersion() {
            return Spi.VERSION;
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            return WriteResult.of(new OutputFile("good.txt", "ok"));
        }
    }

    /** A writer built for a future SPI. */
    public static final class FutureWriter implements CycleWriter {
        @Override
        public String id() {
            return "future";
        }

        @Override
        public int spiVersion() {
            return Spi.VERSION + 1;
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            throw new AssertionError("must not be called");
        }
    }

    /** A writer whose constructor throws. */
    public static final class ExplodingWriter implements CycleWriter {
        public ExplodingWriter() {
            throw new IllegalStateException("boom");
        }

        @Override
        public String id() {
            return "exploding";
        }

        @Override
        public int spiVersion() {
            return Spi.VERSION;
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            throw new AssertionError();
        }
    }

    @Test
    void brokenAndFutureProvidersAreSkippedWithFindings() {
        Providers.Loaded<CycleWriter> loaded = Providers.writers(new FakeServicesLoader());
        assertEquals(List.of("good"), loaded.providers().stream().map(CycleWriter::id).collect(Collectors.toList()));
        List<String> codes = loaded.problems().stream().map(f -> f.code()).sorted().collect(Collectors.toList());
        // three skipped: a class that does not exist, a constructor that throws, a future SPI version
        assertEquals(List.of("SPI_PROVIDER_BROKEN", "SPI_PROVIDER_BROKEN", "SPI_VERSION_MISMATCH"), codes);
    }

    @Test
    void missingPlannerNamesTheKindAndWhatToAdd() {
        ProviderMissingException e = assertThrows(ProviderMissingException.class,
                () -> Providers.planner(new FakeServicesLoader()));
        assertTrue(e.getMessage().contains("CyclePlanner"), e.getMessage());
        assertTrue(e.getMessage().contains("hobwright-wizard"), e.getMessage());
    }

    @Test
    void missingWriterNamesTheId() {
        ProviderMissingException e = assertThrows(ProviderMissingException.class,
                () -> Providers.writer(new FakeServicesLoader(), "nc"));
        assertTrue(e.getMessage().contains("\"nc\""), e.getMessage());
    }

    @Test
    void writerFoundById() {
        assertEquals("good", Providers.writer(new FakeServicesLoader(), "good").id());
    }
}
