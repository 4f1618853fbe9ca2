package org.hobwright.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.reflect.Modifier;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.hobwright.api.spi.ApiVersion;
import org.junit.jupiter.api.Test;

/** Every public type of the api carries its stability marker, with a version no newer than this api. */
class ApiStatusTest {

    private static List<Class<?>> publicTypes() throws IOException, URISyntaxException, ClassNotFoundException {
        Path root = Path.of(Hobwright.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        List<Class<?>> out = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root.resolve("org/hobwright/api"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".class")).toList()) {
                String name = root.relativize(f).toString().replace('/', '.').replace('\\', '.');
                name = name.substring(0, name.length() - ".class".length());
                if (name.endsWith("package-info") || name.startsWith("org.hobwright.api.internal.")) {
                    continue;
                }
                Class<?> c = Class.forName(name, false, Hobwright.class.getClassLoader());
                if (isPublic(c)) {
                    out.add(c);
                }
            }
        }
        return out;
    }

    private static boolean isPublic(Class<?> c) {
        for (Class<?> k = c; k != null; k = k.getEnclosingClass()) {
            if (!Modifier.isPublic(k.getModifiers()) || k.isAnonymousClass() || k.isLocalClass()) {
                return false;
            }
        }
        return true;
    }

    @Test
    void everyPublicTypeIsMarked() throws Exception {
        List<Class<?>> types = publicTypes();
        assertTrue(types.size() > 60, "the api's public types were found: " + types.size());
        List<String> unmarked = types.stream().filter(c -> !c.isAnnotationPresent(ApiStatus.class))
                .map(Class::getName).toList();
        assertEquals(List.of(), unmarked);
    }

    @Test
    void noMarkerIsNewerThanThisApi() throws Exception {
        for (Class<?> c : publicTypes()) {
            ApiVersion since = ApiVersion.parse(c.getAnnotation(ApiStatus.class).since());
            assertTrue(since.compareTo(ApiVersion.CURRENT) <= 0, c.getName() + " since " + since);
        }
    }
}
