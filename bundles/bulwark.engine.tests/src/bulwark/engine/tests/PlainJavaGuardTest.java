package bulwark.engine.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The engine must run anywhere: no Eclipse, OSGi or SWT import in its sources and no bundle dependency
 * in its manifest. This test reads the engine bundle's own files.
 */
class PlainJavaGuardTest {
	private static final Path ENGINE = Path.of(System.getProperty("bulwark.root", "../.."), "bundles", "bulwark.engine");

	@Test
	void noEclipseImports() throws IOException {
		Path src = ENGINE.resolve("src");
		assertTrue(Files.isDirectory(src), "engine sources not found at " + src.toAbsolutePath());
		List<String> offenders;
		try (Stream<Path> files = Files.walk(src)) {
			offenders = files.filter(p -> p.toString().endsWith(".java")).filter(PlainJavaGuardTest::importsEclipse)
					.map(Path::toString).collect(Collectors.toList());
		}
		assertEquals(List.of(), offenders);
	}

	@Test
	void manifestRequiresNothing() throws IOException {
		String manifest = Files.readString(ENGINE.resolve("META-INF/MANIFEST.MF"));
		assertFalse(manifest.contains("Require-Bundle"), manifest);
		assertFalse(manifest.contains("Import-Package"), manifest);
	}

	private static boolean importsEclipse(Path file) {
		try {
			return Files.readAllLines(file).stream().map(String::trim)
					.anyMatch(l -> l.startsWith("import org.eclipse") || l.startsWith("import org.osgi")
							|| l.startsWith("import static org.eclipse"));
		} catch (IOException e) {
			throw new IllegalStateException(e);
		}
	}
}
