package bulwark.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import java.util.function.BooleanSupplier;

import org.eclipse.jface.text.IDocument;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;

import bulwark.ui.Application;
import bulwark.ui.Screenshot;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.editor.FindingAnnotation;
import bulwark.ui.findings.FindingsView;

/**
 * Runs inside the workbench (Tycho UI harness, under Xvfb in CI). The screenshot test runs first, so that the
 * picture is of a freshly opened design; the typing test then edits it.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class DesignEditorUiTest {
	/** Generous: the first check builds the language injector. */
	private static final long DEADLINE_MS = 60_000;
	private static final Path ROOT = Path.of(System.getProperty("bulwark.root", "../..")).toAbsolutePath().normalize();
	private static final Path LAB = ROOT.resolve("examples/lab-indicator-seeded.bulwark");

	private IWorkbenchPage page() {
		return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
	}

	@AfterEach
	void closeEditors() {
		page().closeAllEditors(false);
	}

	/** Keeps the UI thread dispatching until the condition holds or the deadline passes. */
	private static boolean waitUntil(BooleanSupplier condition) {
		Display display = Display.getCurrent();
		long end = System.currentTimeMillis() + DEADLINE_MS;
		while (!condition.getAsBoolean()) {
			if (System.currentTimeMillis() > end) {
				return false;
			}
			if (!display.readAndDispatch()) {
				display.timerExec(20, () -> {
				});
				display.sleep();
			}
		}
		return true;
	}

	private static Optional<FindingAnnotation> powerAnnotation(DesignEditor editor) {
		return editor.findingAnnotations().stream().filter(a -> a.finding().rule().text().equals("resistor-power"))
				.findFirst();
	}

	@Test
	@Order(1)
	void powerFindingIsMarkedAndListed() throws Exception {
		FindingsView view = (FindingsView) page().showView(FindingsView.ID);
		DesignEditor editor = Application.openFile(page(), LAB);
		assertTrue(waitUntil(() -> powerAnnotation(editor).isPresent()), "no power finding marked in the editor");
		FindingAnnotation marker = powerAnnotation(editor).orElseThrow();
		assertEquals(FindingAnnotation.ERROR, marker.getType());
		assertEquals(21, editor.lineOf(marker), "marker on R_DROP's declaration (line 22)");
		assertTrue(waitUntil(() -> view.shownFindings().stream().map(f -> f.rule().text()).anyMatch("resistor-power"::equals)),
				"findings view does not list the power finding");
		screenshot("editor-power-finding.png");
		// still true after the picture: no late result from an earlier check replaced it
		assertTrue(powerAnnotation(editor).isPresent(), "power marker gone after the screenshot");
		assertTrue(view.shownFindings().stream().map(f -> f.rule().text()).anyMatch("resistor-power"::equals),
				"findings view lost the power finding");
	}

	@Test
	@Order(2)
	void hoverOverAPartShowsItsWorstStress() throws Exception {
		DesignEditor editor = Application.openFile(page(), LAB);
		assertTrue(waitUntil(() -> editor.lastResult() != null), "no check result");
		String hover = editor.hoverText("R_DROP");
		// the output shorted: 12²/150 = 0.96 W against 125 mW derated to 60 % [closed form]: 1280 %
		assertTrue(hover.startsWith("R_DROP, worst stress per rating\n"), hover);
		assertTrue(hover.contains("\n  power: 960 mW in case 'normal, LAMP_OUT shorted to LAMP_RET', 1280 % of 75 mW"), hover);
		assertTrue(hover.contains("\nerror resistor-power: R_DROP: power 960 mW"), hover);
		assertEquals(null, editor.hoverText("nothing_here"));
	}

	@Test
	@Order(3)
	void findingDisappearsWhileTyping() throws Exception {
		FindingsView view = (FindingsView) page().showView(FindingsView.ID);
		DesignEditor editor = Application.openFile(page(), LAB);
		assertTrue(waitUntil(() -> powerAnnotation(editor).isPresent()), "no power finding marked in the editor");
		IDocument doc = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		int at = doc.get().indexOf("rated power 125 mW");
		long typed = System.nanoTime();
		doc.replace(at, "rated power 125 mW".length(), "rated power 2 W");
		assertTrue(waitUntil(() -> powerAnnotation(editor).isEmpty()), "power finding still shown after the fix");
		// a measurement for docs/performance.md, not a pass mark: the pause before a check plus the check
		System.out.println("keystroke to updated markers: " + (System.nanoTime() - typed) / 1_000_000 + " ms");
		assertTrue(waitUntil(() -> view.shownFindings().stream().noneMatch(f -> f.rule().text().equals("resistor-power"))),
				"findings view still lists the power finding after the fix");
		assertTrue(editor.isDirty());
	}

	@Test
	@Order(4)
	void savingIsAtomicAndKeepsTheVersionBefore() throws Exception {
		Path dir = java.nio.file.Files.createTempDirectory("bulwark-save");
		Path copy = dir.resolve("lab.bulwark");
		java.nio.file.Files.copy(LAB, copy);
		java.nio.file.Files.copy(LAB.resolveSibling("teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		DesignEditor editor = Application.openFile(page(), copy);
		IDocument doc = editor.getDocumentProvider().getDocument(editor.getEditorInput());
		String before = doc.get();
		doc.replace(doc.get().indexOf("rated power 125 mW"), "rated power 125 mW".length(), "rated power 2 W");
		editor.doSave(null);
		assertTrue(!editor.isDirty(), "clean after the save");
		assertEquals(doc.get(), java.nio.file.Files.readString(copy));
		assertEquals(before, java.nio.file.Files.readString(dir.resolve("lab.bulwark.bak")));
		// the Changes view compares with the version kept: the power finding is fixed, R_DROP better
		bulwark.ui.changes.ChangesView changes = (bulwark.ui.changes.ChangesView) page()
				.showView(bulwark.ui.changes.ChangesView.ID);
		page().activate(editor);
		assertTrue(waitUntil(() -> changes.shownChanges() != null && changes.shownChanges().stream()
				.anyMatch(c -> c.kind().equals("fixed") && c.text().contains("resistor-power"))), "no fixed finding listed");
		assertTrue(changes.shownChanges().stream()
				.anyMatch(c -> c.kind().equals("better") && c.text().startsWith("R_DROP worst utilisation 1280 % → 80 %")));
		try (var files = java.nio.file.Files.list(dir)) {
			assertEquals(3, files.count(), "no temporary file left behind");
		}
	}

	private static void screenshot(String name) throws Exception {
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots").resolve(name));
	}
}
