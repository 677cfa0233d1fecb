package bulwark.ui.tolerance;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.part.ViewPart;
import org.eclipse.xtext.util.CancelIndicator;

import bulwark.check.DesignChecker;
import bulwark.check.Preparation;
import bulwark.check.PreparedDesign;
import bulwark.check.io.AtomicFile;
import bulwark.check.report.ToleranceReport;
import bulwark.check.tolerance.Corners;
import bulwark.check.tolerance.Figure;
import bulwark.check.tolerance.Progress;
import bulwark.check.tolerance.Statistics;
import bulwark.check.tolerance.ToleranceAnalysis;
import bulwark.check.tolerance.Yield;
import bulwark.ui.BulwarkUi;
import bulwark.ui.editor.DesignEditor;
import bulwark.check.policy.Distribution;

/**
 * Tolerance analysis of the design being edited, on demand: corners, then Monte Carlo, in a background job
 * with a progress bar and Cancel; the figures' spreads and the yields in tables; the HTML report saved on
 * request. The same analysis as `bulwark tolerance`.
 */
public class ToleranceView extends ViewPart {
	public static final String ID = "bulwark.ui.tolerance";

	/** One row: a figure with its corner extremes and its Monte Carlo percentiles (empty where not run). */
	public record Row(Figure figure, Corners.Range corners, Statistics statistics) {
	}

	private Spinner samples;
	private Button run, cancel, save;
	private ProgressBar bar;
	private Label status;
	private TableViewer figures, yields;
	private volatile Job job;
	private volatile ToleranceAnalysis.Result result;
	private String resultFile;

	@Override
	public void createPartControl(Composite parent) {
		parent.setLayout(new GridLayout(7, false));
		new Label(parent, SWT.NONE).setText("Samples:");
		samples = new Spinner(parent, SWT.BORDER);
		samples.setValues(1000, 0, 100_000, 0, 100, 1000);
		run = button(parent, "Run", () -> run(activeEditor(), samples.getSelection()));
		cancel = button(parent, "Cancel", this::cancel);
		cancel.setEnabled(false);
		save = button(parent, "Save Report\u2026", this::saveAsked);
		save.setEnabled(false);
		bar = new ProgressBar(parent, SWT.SMOOTH);
		bar.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
		status = new Label(parent, SWT.NONE);
		status.setText("Open a design and press Run.");
		status.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 7, 1));
		figures = table(parent, 3);
		column(figures, "Figure", 230, r -> r.figure().name());
		column(figures, "Nominal", 90, r -> r.corners() == null ? "" : show(r.figure(), r.corners().nominal()));
		column(figures, "Corner low", 90, r -> r.corners() == null ? "" : show(r.figure(), r.corners().low()));
		column(figures, "Corner high", 90, r -> r.corners() == null ? "" : show(r.figure(), r.corners().high()));
		column(figures, "1 %", 90, r -> r.statistics() == null ? "" : show(r.figure(), r.statistics().p1()));
		column(figures, "Median", 90, r -> r.statistics() == null ? "" : show(r.figure(), r.statistics().p50()));
		column(figures, "99 %", 90, r -> r.statistics() == null ? "" : show(r.figure(), r.statistics().p99()));
		yields = table(parent, 1);
		TableViewerColumn what = new TableViewerColumn(yields, SWT.LEFT);
		what.getColumn().setText("Yield");
		what.getColumn().setWidth(420);
		what.setLabelProvider(label(o -> ((Yield) o).requirement()));
		TableViewerColumn share = new TableViewerColumn(yields, SWT.LEFT);
		share.getColumn().setText("Samples meeting it");
		share.getColumn().setWidth(200);
		share.setLabelProvider(label(o -> {
			Yield y = (Yield) o;
			return y.met() + " of " + y.of() + (y.of() == 0 ? "" : " (" + ToleranceReport.percent(y.fraction()) + ")");
		}));
	}

	private static Button button(Composite parent, String text, Runnable action) {
		Button b = new Button(parent, SWT.PUSH);
		b.setText(text);
		b.addListener(SWT.Selection, e -> action.run());
		return b;
	}

	private static TableViewer table(Composite parent, int weight) {
		TableViewer v = new TableViewer(parent, SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.BORDER);
		GridData data = new GridData(SWT.FILL, SWT.FILL, true, true, 7, 1);
		data.heightHint = 40 * weight;
		v.getControl().setLayoutData(data);
		v.getTable().setHeaderVisible(true);
		v.getTable().setLinesVisible(true);
		v.setContentProvider(ArrayContentProvider.getInstance());
		v.setInput(List.of());
		return v;
	}

	private static void column(TableViewer v, String title, int width, java.util.function.Function<Row, String> text) {
		TableViewerColumn c = new TableViewerColumn(v, SWT.LEFT);
		c.getColumn().setText(title);
		c.getColumn().setWidth(width);
		c.setLabelProvider(label(o -> text.apply((Row) o)));
	}

	private static ColumnLabelProvider label(java.util.function.Function<Object, String> text) {
		return new ColumnLabelProvider() {
			@Override
			public String getText(Object element) {
				return text.apply(element);
			}
		};
	}

	private static String show(Figure f, double v) {
		return Double.isFinite(v) ? ToleranceReport.show(f, v) : "—";
	}

	private DesignEditor activeEditor() {
		IEditorPart e = getSite().getPage().getActiveEditor();
		return e instanceof DesignEditor d ? d : null;
	}

	/** Starts a run on the editor's text as it is now; the API the Run button uses. */
	public void run(DesignEditor editor, int sampleCount) {
		if (editor == null || editor.file() == null || editor.file().toString().endsWith(".bulwark-policy")) {
			status.setText("Open a design in the editor first.");
			return;
		}
		if (job != null) {
			return;
		}
		String text = editor.getDocumentProvider().getDocument(editor.getEditorInput()).get();
		String file = editor.file().toString();
		DesignChecker checker = BulwarkUi.checker();
		if (!(checker.prepare(text, file, CancelIndicator.NullImpl) instanceof Preparation.Ready ready)) {
			status.setText("The design has errors (see the Findings view); fix them before a tolerance run.");
			return;
		}
		PreparedDesign design = ready.design();
		Distribution distribution = design.policy().distribution();
		result = null;
		resultFile = file;
		run.setEnabled(false);
		cancel.setEnabled(true);
		save.setEnabled(false);
		bar.setSelection(0);
		status.setText("Running corners, then " + sampleCount + " samples of " + editor.file().getFileName() + "\u2026");
		org.eclipse.swt.widgets.Display display = status.getDisplay();
		Job j = new Job("Tolerance analysis of " + editor.file().getFileName()) {
			@Override
			protected IStatus run(IProgressMonitor monitor) {
				monitor.beginTask(getName(), 1000);
				int[] reported = { 0 };
				ToleranceAnalysis.Result r = ToleranceAnalysis.run(design.loaded().design(), design.policy(), sampleCount, 1,
						distribution, new Progress() {
							@Override
							public synchronized void done(int finished, int total) {
								int permille = (int) (1000L * finished / Math.max(1, total));
								if (permille > reported[0]) {
									monitor.worked(permille - reported[0]);
									reported[0] = permille;
									display.asyncExec(() -> {
										if (!bar.isDisposed()) {
											bar.setSelection(permille / 10);
										}
									});
								}
							}

							@Override
							public boolean cancelled() {
								return monitor.isCanceled();
							}
						});
				monitor.done();
				if (!display.isDisposed()) {
					display.asyncExec(() -> finished(r));
				}
				return monitor.isCanceled() ? Status.CANCEL_STATUS : Status.OK_STATUS;
			}
		};
		j.setUser(false);
		job = j;
		j.schedule();
	}

	private void finished(ToleranceAnalysis.Result r) {
		job = null;
		if (status.isDisposed()) {
			return;
		}
		result = r;
		Map<Figure, Row> rows = new LinkedHashMap<>();
		for (Corners.Range c : r.corners().ranges()) {
			rows.put(c.figure(), new Row(c.figure(), c, null));
		}
		for (Statistics s : r.statistics()) {
			Row had = rows.get(s.figure());
			rows.put(s.figure(), new Row(s.figure(), had == null ? null : had.corners(), s));
		}
		figures.setInput(new ArrayList<>(rows.values()));
		yields.setInput(r.yields());
		boolean cancelled = r.corners().cancelled() || r.monteCarlo().cancelled();
		int failures = r.corners().failures().size() + r.monteCarlo().failures().size();
		status.setText((cancelled ? "Cancelled: the figures cover what was finished. " : "Done: ")
				+ r.toleranced().size() + " toleranced parameter(s), " + r.monteCarlo().samples().size() + " sample(s)"
				+ (failures > 0 ? ", " + failures + " evaluation(s) not solved (named in the report)" : "") + ".");
		bar.setSelection(cancelled ? bar.getSelection() : 100);
		run.setEnabled(true);
		cancel.setEnabled(false);
		save.setEnabled(true);
	}

	private void cancel() {
		Job j = job;
		if (j != null) {
			j.cancel();
		}
	}

	private void saveAsked() {
		if (result == null) {
			return;
		}
		FileDialog dialog = new FileDialog(getSite().getShell(), SWT.SAVE);
		dialog.setText("Save the tolerance report");
		dialog.setFilterExtensions(new String[] { "*.html", "*.txt" });
		dialog.setFileName("tolerance.html");
		dialog.setOverwrite(true);
		String file = dialog.open();
		if (file != null) {
			try {
				save(Path.of(file));
			} catch (IOException e) {
				MessageDialog.openError(getSite().getShell(), "Report not saved", "Could not write " + file + ": " + e.getMessage());
			}
		}
	}

	/** Writes the last result as HTML (or text for a .txt name), atomically. */
	public void save(Path file) throws IOException {
		StringWriter w = new StringWriter();
		if (file.toString().endsWith(".txt")) {
			ToleranceReport.text(result, resultFile, bulwark.check.report.Caution.TEXT, w);
		} else {
			ToleranceReport.html(result, resultFile, bulwark.check.report.Caution.TEXT, w);
		}
		AtomicFile.write(file, w.toString(), false);
	}

	/** The last finished result, for tests (null while running). */
	public ToleranceAnalysis.Result result() {
		return result;
	}

	@SuppressWarnings("unchecked")
	public List<Row> shownRows() {
		return (List<Row>) figures.getInput();
	}

	@Override
	public void setFocus() {
		run.setFocus();
	}

	@Override
	public void dispose() {
		cancel();
		super.dispose();
	}
}
