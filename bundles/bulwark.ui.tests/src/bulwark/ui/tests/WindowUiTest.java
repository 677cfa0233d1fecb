package bulwark.ui.tests;

import static bulwark.ui.tests.Ui.page;
import static bulwark.ui.tests.Ui.waitUntil;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CLabel;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;

import bulwark.check.report.Caution;

/** The window itself: every view can be reopened from Window > Show View, and the caution is always in sight. */
class WindowUiTest {
	private static Shell shell() {
		return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell();
	}

	/** A menu's items once it has been shown (the workbench fills its menus when they open). */
	private static List<MenuItem> items(Menu menu) {
		menu.notifyListeners(SWT.Show, new Event());
		List<MenuItem> items = List.of(menu.getItems());
		menu.notifyListeners(SWT.Hide, new Event());
		return items;
	}

	private static MenuItem item(Menu menu, String text) {
		return items(menu).stream().filter(i -> i.getText().replace("&", "").startsWith(text)).findFirst()
				.orElseThrow(() -> new AssertionError("no '" + text + "' in " + items(menu).stream().map(MenuItem::getText)
						.toList()));
	}

	@Test
	void everyViewCanBeReopenedFromTheWindowMenu() {
		Menu views = item(item(shell().getMenuBar(), "Window").getMenu(), "Show View").getMenu();
		List<String> names = items(views).stream().map(i -> i.getText().replace("&", "")).toList();
		for (String view : List.of("Start", "Findings", "Stress Map", "Cases", "Waveform", "Threshold Sweep", "Topology",
				"Changes", "Tolerance", "Outline")) {
			assertTrue(names.stream().anyMatch(n -> n.startsWith(view)), view + " not in " + names);
		}
		var open = page().findView(IPageLayout.ID_OUTLINE);
		if (open != null) {
			page().hideView(open);
		}
		item(views, "Outline").notifyListeners(SWT.Selection, new Event());
		assertTrue(waitUntil(() -> page().findView(IPageLayout.ID_OUTLINE) != null), "the Outline did not open");
	}

	@Test
	void theCautionIsInTheStatusLine() throws Exception {
		// the Start page shows the caution too: without it, only the status line can
		var start = page().findView(bulwark.ui.start.StartView.ID);
		if (start != null) {
			page().hideView(start);
		}
		try {
			List<String> texts = new ArrayList<>();
			collect(shell(), texts);
			assertTrue(texts.stream().anyMatch(t -> t.equals(Caution.SHORT)), "no caution among " + texts);
		} finally {
			if (start != null) {
				page().showView(bulwark.ui.start.StartView.ID);
			}
		}
	}

	private static void collect(Control c, List<String> texts) {
		if (c instanceof CLabel l && l.getText() != null) {
			texts.add(l.getText());
		} else if (c instanceof Label l && l.getText() != null) {
			texts.add(l.getText());
		}
		if (c instanceof Composite parent) {
			for (Control child : parent.getChildren()) {
				collect(child, texts);
			}
		}
	}
}
