package bulwark.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static bulwark.ui.tests.Ui.ROOT;
import static bulwark.ui.tests.Ui.page;
import static bulwark.ui.tests.Ui.waitUntil;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.junit.jupiter.api.Test;

import bulwark.check.finding.Severity;
import bulwark.check.Status;
import bulwark.ui.Screenshot;
import bulwark.ui.changes.ChangesView;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.start.DemoDesigns;
import bulwark.ui.start.NewDesign;
import bulwark.ui.start.StartView;
import bulwark.ui.start.Templates;

/** The start page, new designs from templates, File > Save and comparing two files. */
class StartAndFilesUiTest {
	@Test
	void theStartPageOffersTheDemosTemplatesAndHelp() throws Exception {
		// opened afresh: the page lists what the installation holds when it is created
		var shown = page().findView(StartView.ID);
		if (shown != null) {
			page().hideView(shown);
		}
		StartView start = (StartView) page().showView(StartView.ID);
		assertTrue(DemoDesigns.list().size() >= 5, DemoDesigns.list().toString());
		assertTrue(DemoDesigns.list().stream().anyMatch(d -> d.title().equals("Bilge float-switch tester")));
		// a link per demo and per template, "open", and three help pages
		assertEquals(DemoDesigns.list().size() + Templates.ALL.size() + 1 + 3, start.linkCount());
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/start.png"));
	}

	/** Each demo design opens with the markers its story promises (its comments say why each is there). */
	@Test
	void eachDemoDesignOpensWithItsMarkers() throws Exception {
		var expected = java.util.Map.of(
				"greenhouse-vent-input.bulwark", java.util.List.<String>of(),
				"lab-indicator-seeded.bulwark", java.util.List.of("22 resistor-power"),
				"marina-bilge-switch-tester.bulwark", java.util.List.of("24 requirement", "28 battery-charge", "28 reverse-path",
						"41 base-emitter-reverse", "41 reverse-path", "48 forward-current"),
				"track-section-checker.bulwark", java.util.List.of("28 battery-charge", "28 reverse-path", "35 resistor-power",
						"35 reverse-path", "52 comparator-input", "52 reverse-path", "52 hysteresis"),
				"stage-loom-checker.bulwark", java.util.List.of("19 requirement", "21 battery-charge", "21 reverse-path",
						"28 resistor-power", "28 resistor-voltage", "28 reverse-path", "33 rating-missing", "37 resistor-power",
						"37 reverse-path"));
		for (var demo : expected.entrySet()) {
			DesignEditor editor = bulwark.ui.Application.openFile(page(), ROOT.resolve("examples").resolve(demo.getKey()));
			assertTrue(waitUntil(() -> editor.lastResult() != null), demo.getKey() + " was not checked");
			// 1-based lines of the markers in the editor, as the ruler shows them
			var marked = editor.findingAnnotations().stream().map(a -> (editor.lineOf(a) + 1) + " " + a.finding().rule())
					.sorted().toList();
			assertEquals(demo.getValue().stream().sorted().toList(), marked, demo.getKey());
			page().closeEditor(editor, false);
		}
	}

	@Test
	void everyTemplatePassesTheDefaultPolicy() throws Exception {
		Path dir = Files.createTempDirectory("bulwark-new");
		for (Templates.Template t : Templates.ALL) {
			DesignEditor editor = NewDesign.create(page(), t, dir.resolve(t.file()));
			assertTrue(waitUntil(() -> editor.lastResult() != null), t.name() + " was not checked");
			var result = editor.lastResult();
			assertEquals(Status.PASS, result.status(), t.name() + ": " + result.findings());
			assertTrue(result.findings().stream().noneMatch(f -> f.severity() != Severity.INFO), t.name() + ": " + result.findings());
			assertEquals(t.text(), Files.readString(dir.resolve(t.file())));
			page().closeEditor(editor, false);
		}
	}

	@Test
	void fileSaveWritesTheText() throws Exception {
		Path dir = Files.createTempDirectory("bulwark-save");
		Path file = dir.resolve("d.bulwark");
		DesignEditor editor = NewDesign.create(page(), Templates.ALL.get(0), file);
		var document = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		document.replace(document.getLength(), 0, "# saved through File > Save\n");
		page().activate(editor);
		PlatformUI.getWorkbench().getService(IHandlerService.class).executeCommand("org.eclipse.ui.file.save", null);
		assertTrue(Files.readString(file).endsWith("# saved through File > Save\n"));
		assertTrue(!editor.isDirty());
		page().closeEditor(editor, false);
	}

	@Test
	void twoFilesCompared() throws Exception {
		Path dir = Files.createTempDirectory("bulwark-compare");
		Path before = dir.resolve("lab-1.bulwark"), after = dir.resolve("lab-2.bulwark");
		String lab = Files.readString(ROOT.resolve("examples/lab-indicator-seeded.bulwark"));
		Files.copy(ROOT.resolve("examples/teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		Files.writeString(before, lab);
		Files.writeString(after, lab.replace("  value 150 Ω ± 5 %\n  rated power 125 mW", "  value 150 Ω ± 5 %\n  rated power 2 W"));
		ChangesView changes = (ChangesView) page().showView(ChangesView.ID);
		var shown = changes.compareFiles(before, after);
		assertTrue(shown.stream().anyMatch(c -> c.kind().equals("fixed") && c.text().contains("resistor-power")), shown.toString());
		assertTrue(shown.stream().anyMatch(c -> c.kind().equals("better") && c.text().startsWith("R_DROP")), shown.toString());
		assertEquals(shown, changes.shownChanges());
	}
}
