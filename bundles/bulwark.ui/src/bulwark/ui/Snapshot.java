package bulwark.ui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.report.TextReport;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.editor.FindingAnnotation;

/**
 * The workbench's {@code --snapshot FILE} option, for checking a built product without a person at the
 * screen: once the opened design has been checked and marked, it saves a screenshot to FILE, the findings
 * the editor marks to FILE.txt, and closes the workbench.
 */
final class Snapshot {
	private static final long DEADLINE_MS = 120_000;

	private Snapshot() {
	}

	/** With no editor (no design named, or it did not open) it writes what it has at once. */
	static void whenChecked(IWorkbenchWindow window, DesignEditor editor, Path file) {
		if (editor == null) {
			write(window, null, null, file);
			PlatformUI.getWorkbench().close();
			return;
		}
		long deadline = System.currentTimeMillis() + DEADLINE_MS;
		Display display = window.getShell().getDisplay();
		Runnable[] poll = new Runnable[1];
		poll[0] = () -> {
			DesignResult result = editor.lastResult();
			boolean marked = result != null && editor.findingAnnotations().size() == result.findings().size();
			if (!marked && System.currentTimeMillis() < deadline) {
				display.timerExec(100, poll[0]);
				return;
			}
			write(window, editor, result, file);
			PlatformUI.getWorkbench().close();
		};
		display.timerExec(100, poll[0]);
	}

	private static void write(IWorkbenchWindow window, DesignEditor editor, DesignResult result, Path file) {
		List<String> lines = new ArrayList<>();
		if (editor == null) {
			lines.add("no design editor was opened");
		} else if (result == null) {
			lines.add("no check result before the deadline");
		} else {
			for (FindingAnnotation a : editor.findingAnnotations()) {
				Finding f = a.finding();
				lines.add("marked line " + (editor.lineOf(a) + 1) + ": " + TextReport.line(result.file(), f));
			}
		}
		lines.add(bulwark.check.report.Caution.TEXT);
		try {
			Screenshot.save(window.getShell(), file);
			Files.write(Path.of(file + ".txt"), lines, StandardCharsets.UTF_8);
		} catch (IOException e) {
			System.err.println("bulwark: cannot write snapshot: " + e);
		}
	}
}
