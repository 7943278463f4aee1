package org.depotcast;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

/** The committed demo CSVs are exactly what the committed, seeded generator writes. */
class DemoGeneratorTest {
    private static final List<String> FILES = List.of("locations.csv", "parts.csv", "pump-models.csv",
            "planted-rates.csv", "pumps.csv", "usage-readings.csv", "repairs.csv", "opening-stock.csv",
            "purchase-orders.csv");

    @Test
    void generatorReproducesTheCommittedFiles(@TempDir Path work) throws Exception {
        JavaCompiler compiler = ToolProvider.getSystemJavaCompiler();
        assertNotNull(compiler, "tests run on a JDK");
        Path classes = Files.createDirectories(work.resolve("classes"));
        int status = compiler.run(null, null, null, "-d", classes.toString(),
                Path.of("seed-data", "generator", "GenerateDemoProgramme.java").toString());
        assertEquals(0, status);
        Path out = work.resolve("out");
        try (URLClassLoader loader = new URLClassLoader(new URL[]{classes.toUri().toURL()})) {
            loader.loadClass("GenerateDemoProgramme").getMethod("main", String[].class)
                    .invoke(null, (Object) new String[]{out.toString()});
        }
        for (String file : FILES) {
            assertEquals(Files.readString(Path.of("seed-data", file)), Files.readString(out.resolve(file)), file);
        }
    }
}
