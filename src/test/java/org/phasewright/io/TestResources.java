package org.phasewright.io;

import java.net.URISyntaxException;
import java.nio.file.Path;

/** Paths of test resources on the class path. */
public final class TestResources {

    private TestResources() {
    }

    public static Path path(String name) {
        try {
            return Path.of(TestResources.class.getClassLoader().getResource(name).toURI());
        } catch (URISyntaxException | NullPointerException e) {
            throw new IllegalStateException("missing test resource " + name, e);
        }
    }
}
