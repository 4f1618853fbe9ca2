package org.hobwright.hosttest;

import java.io.IOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Enumeration;
import java.util.List;

/**
 * The class loader many hosts give each plugin to keep its libraries apart from their own: the
 * plugin's jar first, the host's class path only for what the plugin does not hold. The JDK and
 * Hobwright's api ({@code org.hobwright.api}) always come from the host, so that the host and the
 * plugin share one copy of the api's types.
 */
final class ChildFirstLoader extends URLClassLoader {
    private static final String[] SHARED = {"java.", "javax.", "jdk.", "sun.", "org.hobwright.api."};

    ChildFirstLoader(URL[] urls, ClassLoader parent) {
        super(urls, parent);
    }

    @Override
    protected Class<?> loadClass(String name, boolean resolve) throws ClassNotFoundException {
        synchronized (getClassLoadingLock(name)) {
            Class<?> c = findLoadedClass(name);
            if (c == null) {
                if (shared(name)) {
                    c = super.loadClass(name, false);
                } else {
                    try {
                        c = findClass(name);
                    } catch (ClassNotFoundException notHere) {
                        c = super.loadClass(name, false);
                    }
                }
            }
            if (resolve) {
                resolveClass(c);
            }
            return c;
        }
    }

    @Override
    public URL getResource(String name) {
        URL own = findResource(name);
        return own != null ? own : super.getResource(name);
    }

    @Override
    public Enumeration<URL> getResources(String name) throws IOException {
        List<URL> all = new ArrayList<>(Collections.list(findResources(name)));
        ClassLoader parent = getParent();
        if (parent != null) {
            all.addAll(Collections.list(parent.getResources(name)));
        }
        return Collections.enumeration(all);
    }

    private static boolean shared(String name) {
        for (String prefix : SHARED) {
            if (name.startsWith(prefix)) {
                return true;
            }
        }
        return false;
    }
}
