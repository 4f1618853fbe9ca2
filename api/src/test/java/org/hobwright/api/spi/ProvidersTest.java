package org.hobwright.api.spi;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
        public String apiVersion() {
            return Spi.API_VERSION;
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            return WriteResult.of(new OutputFile("good.txt", "ok"));
        }
    }

    /** A writer built against a newer minor version of this api. */
    public static final class FutureWriter implements CycleWriter {
        @Override
        public String id() {
            return "future";
        }

        @Override
        public String buildVersion() {
            return "9.9.9";
        }

        @Override
        public int spiVersion() {
            return Spi.VERSION;
        }

        @Override
        public String apiVersion() {
            return ApiVersion.CURRENT.major() + "." + (ApiVersion.CURRENT.minor() + 1);
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
        public String apiVersion() {
            return Spi.API_VERSION;
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            throw new AssertionError();
        }
    }

    @Test
    void brokenAndFutureProvidersAreSkippedWithFindings() {
        Providers.Loaded<CycleWriter> loaded = Providers.writers(new FakeServicesLoader());
        assertEquals(List.of("good", "first"), loaded.providers().stream().map(CycleWriter::id).collect(Collectors.toList()));
        List<String> codes = loaded.problems().stream().map(f -> f.code()).sorted().collect(Collectors.toList());
        // skipped: a class that does not exist, a constructor that throws, a newer minor and another major api
        assertEquals(List.of("SPI_API_MAJOR_MISMATCH", "SPI_API_TOO_OLD", "SPI_PROVIDER_BROKEN",
                "SPI_PROVIDER_BROKEN"), codes);
        String tooOld = loaded.problems().stream().filter(f -> f.code().equals("SPI_API_TOO_OLD")).findFirst()
                .orElseThrow().message();
        assertTrue(tooOld.contains("FutureWriter") && tooOld.contains("built against api "
                + ApiVersion.CURRENT.major() + "." + (ApiVersion.CURRENT.minor() + 1)) && tooOld.contains("(build 9.9.9)")
                && tooOld.contains("this host's api " + ApiVersion.CURRENT), tooOld);
        String boom = loaded.problems().stream().filter(f -> f.message().contains("boom")).findFirst()
                .orElseThrow().message();
        assertTrue(boom.contains("caused by java.lang.IllegalStateException: boom"), "the cause is kept: " + boom);
    }

    /** A writer built against the next major version. */
    public static final class NextMajorWriter implements CycleWriter {
        @Override
        public String id() {
            return "next-major";
        }

        @Override
        public int spiVersion() {
            return Spi.VERSION;
        }

        @Override
        public String apiVersion() {
            return (ApiVersion.CURRENT.major() + 1) + ".0";
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            throw new AssertionError("must not be called");
        }
    }

    /** A writer that does not say its api version was built against the first api and still runs. */
    public static final class FirstApiWriter implements CycleWriter {
        @Override
        public String id() {
            return "first";
        }

        @Override
        public int spiVersion() {
            return Spi.VERSION;
        }

        @Override
        public WriteResult write(HobCycle cycle, WriteContext context) {
            return WriteResult.of(new OutputFile("first.txt", "ok"));
        }
    }

    @Test
    void versionRuleSameMajorNoNewerMinor() {
        ApiVersion host = new ApiVersion(1, 1);
        assertTrue(host.runs(new ApiVersion(1, 0)));
        assertTrue(host.runs(new ApiVersion(1, 1)));
        assertFalse(host.runs(new ApiVersion(1, 2)));
        assertFalse(host.runs(new ApiVersion(2, 0)));
        assertEquals("1.1", ApiVersion.parse(" 1.1 ").toString());
        assertThrows(IllegalArgumentException.class, () -> ApiVersion.parse("1"));
        assertThrows(IllegalArgumentException.class, () -> ApiVersion.parse("1.x"));
        assertEquals(ApiVersion.CURRENT, ApiVersion.parse(Spi.API_VERSION));
    }

    @Test
    void missingProviderCarriesTheSkippedOnes() {
        ProviderMissingException e = assertThrows(ProviderMissingException.class,
                () -> Providers.writer(new FakeServicesLoader(), "future"));
        assertTrue(e.problems().stream().anyMatch(f -> f.code().equals("SPI_API_TOO_OLD")), e.problems().toString());
        assertTrue(e.getMessage().contains("newer than this host's api"), e.getMessage());
    }

    @Test
    void missingPlannerNamesTheKindAndWhatToAdd() {
        ProviderMissingException e = assertThrows(ProviderMissingException.class,
                () -> Providers.planner(new FakeServicesLoader()));
        assertTrue(e.getMessage().contains("CyclePlanner"), e.getMessage());
        assertTrue(e.getMessage().contains("hobwright-plugin.jar"), e.getMessage());
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
