package bulwark.ui;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

import bulwark.ui.cases.CasesView;
import bulwark.ui.changes.ChangesView;
import bulwark.ui.findings.FindingsView;
import bulwark.ui.stress.StressMapView;
import bulwark.ui.sweep.SweepView;
import bulwark.ui.topology.TopologyView;

/** The editor with the findings below it, and the stress map, threshold sweep, waveform and the rest beside them. */
public class ReviewPerspective implements IPerspectiveFactory {
	public static final String ID = "bulwark.ui.perspective";

	@Override
	public void createInitialLayout(IPageLayout layout) {
		layout.setEditorAreaVisible(true);
		layout.addView(FindingsView.ID, IPageLayout.BOTTOM, 0.62f, layout.getEditorArea());
		var right = layout.createFolder("bulwark.ui.right", IPageLayout.RIGHT, 0.58f, layout.getEditorArea());
		right.addView(StressMapView.ID);
		right.addView(SweepView.ID);
		right.addView(bulwark.ui.waveform.WaveformView.ID);
		right.addView(CasesView.ID);
		right.addView(TopologyView.ID);
		right.addView(ChangesView.ID);
		right.addView(bulwark.ui.tolerance.ToleranceView.ID);
		layout.addPlaceholder(bulwark.ui.start.StartView.ID, IPageLayout.LEFT, 0.5f, layout.getEditorArea());
	}
}
