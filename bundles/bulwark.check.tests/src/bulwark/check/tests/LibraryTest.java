package bulwark.check.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.Status;
import bulwark.check.rules.ResistorPowerRule;
import bulwark.check.rules.RatingMissingRule;


/** Part definitions from library files: found beside the design or on the library path, never outside. */
class LibraryTest {
	private static final String LIBRARY = """
			library "test parts"
			define resistor CHIP_0805 { package 0805 rated power 125 mW }
			""";

	/** 12 V across 100 Ω + 200 Ω: R1 dissipates (40 mA)²·100 Ω = 160 mW [closed form], over the 125 mW it inherits. */
	private static final String DESIGN = """
			design "uses a library"
			use "lib/parts.bulwark"
			reference net gnd
			net v
			net m
			source V1 (plus: v, minus: gnd) { voltage 12 V }
			resistor R1 (a: v, b: m) is CHIP_0805 { value 100 Ω }
			resistor R2 (a: m, b: gnd) is CHIP_0805 { value 200 Ω rated power 1 W }
			""";

	private static Path write(Path dir, String name, String text) throws IOException {
		Path file = dir.resolve(name);
		Files.createDirectories(file.getParent());
		Files.writeString(file, text);
		return file;
	}

	@Test
	void aPartTakesItsDefinitionsSettingsAndOverridesThem(@TempDir Path dir) throws IOException {
		write(dir, "lib/parts.bulwark", LIBRARY);
		DesignResult r = Fixtures.checker().check(write(dir, "d.bulwark", DESIGN));
		assertEquals(Status.FAIL, r.status(), r.findings().toString());
		Finding f = Fixtures.only(r, ResistorPowerRule.ID);
		assertEquals("R1", f.part());
		assertEquals(0.04 * 0.04 * 100, f.value(), 1e-12);
		assertEquals(0.125, f.limit(), 0); // from the definition, not derated under the as-written policy
		// R2 overrides the power and keeps the package: nothing missing, nothing over
		assertTrue(Fixtures.actual(r, RatingMissingRule.ID).isEmpty(), r.findings().toString());
	}

	@Test
	void aLibraryWithAnErrorStopsTheCheck(@TempDir Path dir) throws IOException {
		// a voltage written as a power rating: refused in a design, so refused in a library too — never 5 kW
		write(dir, "lib/parts.bulwark", """
				library "test parts"
				define resistor CHIP_0805 { package 0805 rated power 5 kV }
				""");
		DesignResult r = Fixtures.checker().check(write(dir, "d.bulwark", DESIGN));
		assertEquals(Status.ERROR, r.status(), r.findings().toString());
		Finding f = r.findings().stream().filter(x -> x.message().startsWith("the library 'lib/parts.bulwark' has an error at 2:"))
				.findFirst().orElseThrow(() -> new AssertionError(r.findings().toString()));
		assertEquals(2, f.location().line(), "at the use line");
		assertTrue(f.message().contains("power"), f.message());
	}

	@Test
	void aMissingLibraryIsALocatedError(@TempDir Path dir) throws IOException {
		DesignResult r = Fixtures.checker().check(write(dir, "d.bulwark", DESIGN));
		assertEquals(Status.ERROR, r.status());
		// the folders looked in, as a person writes them, never a list's brackets
		assertTrue(r.findings().stream().noneMatch(x -> x.message().contains("in [")), r.findings().toString());
		Finding f = r.findings().stream().filter(x -> x.message().contains("no library file 'lib/parts.bulwark'"))
				.findFirst().orElseThrow(() -> new AssertionError(r.findings().toString()));
		assertEquals(2, f.location().line());
		assertEquals(5, f.location().column());
	}

	@Test
	void aRefusedUseIsReportedOnce(@TempDir Path dir) throws IOException {
		write(dir, "x.xmi", "<?xml version=\"1.0\"?><xmi:XMI xmlns:xmi=\"http://www.omg.org/XMI\"/>\n");
		for (String use : new String[] { "x.xmi", "lib/parts.bulwark" }) {
			DesignResult r = Fixtures.checker().check(write(dir, "d.bulwark", Fixtures.replaced(DESIGN, "lib/parts.bulwark", use)));
			assertEquals(Status.ERROR, r.status());
			// one finding at the use, whatever else the missing definitions cost the parts that name them
			assertEquals(1, r.findings().stream().filter(x -> x.location().line() == 2).count(), use + ": " + r.findings());
		}
	}

	@Test
	void aLibraryOutsideTheFolderIsRefused(@TempDir Path dir) throws IOException {
		write(dir, "parts.bulwark", LIBRARY);
		Path design = write(dir, "designs/d.bulwark", Fixtures.replaced(DESIGN, "lib/parts.bulwark", "../parts.bulwark"));
		DesignResult r = Fixtures.checker().check(design);
		assertEquals(Status.ERROR, r.status());
		assertTrue(r.findings().stream().anyMatch(x -> x.message().contains("leaves the design's folder")),
				r.findings().toString());
		DesignResult absolute = Fixtures.checker().check(write(dir, "designs/e.bulwark",
				Fixtures.replaced(DESIGN, "lib/parts.bulwark", dir.resolve("parts.bulwark").toString())));
		assertTrue(absolute.findings().stream().anyMatch(x -> x.message().contains("must be relative")),
				absolute.findings().toString());
	}

	@Test
	void aLinkOutOfTheFolderIsRefused(@TempDir Path dir) throws IOException {
		Path outside = write(dir, "outside/parts.bulwark", LIBRARY);
		Files.createDirectories(dir.resolve("designs/lib"));
		Files.createSymbolicLink(dir.resolve("designs/lib/parts.bulwark"), outside);
		DesignResult r = Fixtures.checker().check(write(dir, "designs/d.bulwark", DESIGN));
		assertTrue(r.findings().stream().anyMatch(x -> x.message().contains("links to a file outside")),
				r.findings().toString());
	}

	@Test
	void theLibraryPathIsSearchedToo(@TempDir Path dir) throws IOException {
		write(dir, "shared/lib/parts.bulwark", LIBRARY);
		Path design = write(dir, "designs/d.bulwark", DESIGN);
		DesignResult r = Fixtures.checkerWithLibraries(List.of(dir.resolve("shared"))).check(design);
		assertEquals(Status.FAIL, r.status(), r.findings().toString());
		// without the folder on the library path the same design cannot find its parts
		DesignResult without = Fixtures.checker().check(design);
		assertTrue(without.findings().stream().anyMatch(x -> x.message().contains("no library file")),
				without.findings().toString());
	}

	@Test
	void aDefinitionOfAnotherKindIsAnError(@TempDir Path dir) throws IOException {
		write(dir, "lib/parts.bulwark", LIBRARY);
		DesignResult r = Fixtures.checker().check(write(dir, "d.bulwark",
				DESIGN + "net k\ndiode D1 (anode: m, cathode: k) is CHIP_0805\n"));
		assertTrue(r.findings().stream().anyMatch(x -> x.message().contains("D1 is a diode, but CHIP_0805 defines a resistor")),
				r.findings().toString());
	}
}
