package bulwark.ui.start;

import org.eclipse.core.commands.common.NotDefinedException;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Link;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.part.ViewPart;

import bulwark.ui.Application;

/**
 * The page the workbench opens with when no design is named: the demo designs, new designs from the
 * templates, the help pages, and the cautions.
 */
public class StartView extends ViewPart {
	public static final String ID = "bulwark.ui.start";


	private ScrolledComposite scroll;
	private int links;

	@Override
	public void createPartControl(Composite parent) {
		scroll = new ScrolledComposite(parent, SWT.V_SCROLL | SWT.H_SCROLL);
		Composite body = new Composite(scroll, SWT.NONE);
		body.setLayout(new GridLayout(1, false));
		Label title = new Label(body, SWT.NONE);
		title.setText("Bulwark");
		title.setFont(JFaceResources.getHeaderFont());
		paragraph(body, "Write an instrument input's circuit with every part's ratings; Bulwark solves it under "
				+ "mains, surges and a reversed battery on its terminals and marks every part over its derated "
				+ "rating as you type.");

		heading(body, "Demo designs");
		for (DemoDesigns.Demo demo : DemoDesigns.list()) {
			link(body, "<a>" + escape(demo.title()) + "</a>   " + demo.file().getFileName(),
					() -> Application.openFile(getSite().getPage(), demo.file()));
		}
		if (DemoDesigns.list().isEmpty()) {
			paragraph(body, "No demo designs in " + DemoDesigns.folder() + ".");
		}

		heading(body, "Start a design");
		for (Templates.Template t : Templates.ALL) {
			link(body, "<a>" + escape(t.name()) + "</a>   " + escape(t.description()),
					() -> NewDesign.askAndCreate(getSite().getShell(), getSite().getPage(), t));
		}
		link(body, "<a>Open a design or review policy\u2026</a>", () -> command("bulwark.ui.file.open"));

		heading(body, "Help");
		link(body, "<a>User guide</a>", () -> command("bulwark.ui.help.user-guide"));
		link(body, "<a>Language reference</a>", () -> command("bulwark.ui.help.language"));
		link(body, "<a>Rule catalogue</a>", () -> command("bulwark.ui.help.rule-catalogue"));

		heading(body, "Safety");
		paragraph(body, bulwark.check.report.Caution.TEXT);

		scroll.setContent(body);
		scroll.setExpandHorizontal(true);
		scroll.setExpandVertical(true);
		scroll.setMinSize(body.computeSize(520, SWT.DEFAULT));
	}

	private static void heading(Composite body, String text) {
		Label l = new Label(body, SWT.NONE);
		l.setText(text);
		l.setFont(JFaceResources.getBannerFont());
		GridData gap = new GridData();
		gap.verticalIndent = 10;
		l.setLayoutData(gap);
	}

	private static void paragraph(Composite body, String text) {
		Label l = new Label(body, SWT.WRAP);
		l.setText(text);
		GridData wide = new GridData(SWT.FILL, SWT.TOP, true, false);
		wide.widthHint = 480;
		l.setLayoutData(wide);
	}

	private void link(Composite body, String text, Runnable action) {
		Link link = new Link(body, SWT.NONE);
		link.setText(text);
		link.addListener(SWT.Selection, e -> action.run());
		links++;
	}

	private void command(String id) {
		try {
			getSite().getService(IHandlerService.class).executeCommand(id, null);
		} catch (NotDefinedException | org.eclipse.core.commands.ExecutionException
				| org.eclipse.core.commands.NotEnabledException | org.eclipse.core.commands.NotHandledException e) {
			throw new IllegalStateException(id, e);
		}
	}

	private static String escape(String text) {
		return text.replace("&", "&&");
	}

	/** How many links the page offers, for tests. */
	public int linkCount() {
		return links;
	}

	@Override
	public void setFocus() {
		scroll.setFocus();
	}
}
