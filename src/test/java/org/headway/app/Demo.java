package org.headway.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** The bundled demo project, copied to a folder so tests may save over it. */
final class Demo {

    static final String RESOURCE = "/fluids-data/examples/demo-orchard-booster.json";

    private Demo() {}

    static Path copyTo(Path folder) throws IOException {
        Path target = folder.resolve("demo-orchard-booster.json");
        try (InputStream in = Demo.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IOException("demo project missing from the classpath: " + RESOURCE);
            }
            Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
        }
        return target;
    }
}
