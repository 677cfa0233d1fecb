package bulwark.ui;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

import bulwark.ui.findings.FindingsView;

/** The editor with the findings below it. */
public class ReviewPerspective implements IPerspectiveFactory {
	public static final String ID = "bulwark.ui.perspective";

	@Override
	public void createInitialLayout(IPageLayout layout) {
		layout.setEditorAreaVisible(true);
		layout.addView(FindingsView.ID, IPageLayout.BOTTOM, 0.62f, layout.getEditorArea());
	}
}
