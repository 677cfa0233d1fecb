package bulwark.ui.start;

import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.ListViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;

/** Lists the templates with what each one is; double-click or OK takes one. */
class TemplateDialog extends Dialog {
	private Templates.Template chosen = Templates.ALL.get(0);

	TemplateDialog(Shell parent) {
		super(parent);
	}

	@Override
	protected void configureShell(Shell shell) {
		super.configureShell(shell);
		shell.setText("New design");
	}

	@Override
	protected Control createDialogArea(Composite parent) {
		Composite area = (Composite) super.createDialogArea(parent);
		area.setLayout(new GridLayout(1, false));
		new Label(area, SWT.NONE).setText("Start from:");
		ListViewer list = new ListViewer(area, SWT.SINGLE | SWT.BORDER);
		list.getControl().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
		list.setContentProvider(ArrayContentProvider.getInstance());
		list.setLabelProvider(new LabelProvider() {
			@Override
			public String getText(Object element) {
				return ((Templates.Template) element).name();
			}
		});
		Label about = new Label(area, SWT.WRAP);
		GridData wide = new GridData(SWT.FILL, SWT.TOP, true, false);
		wide.widthHint = 420;
		about.setLayoutData(wide);
		list.setInput(Templates.ALL);
		list.addSelectionChangedListener(e -> {
			if (((IStructuredSelection) e.getSelection()).getFirstElement() instanceof Templates.Template t) {
				chosen = t;
				about.setText(t.description());
				area.layout();
			}
		});
		list.addDoubleClickListener(e -> buttonPressed(IDialogConstants.OK_ID));
		list.setSelection(new org.eclipse.jface.viewers.StructuredSelection(chosen));
		return area;
	}

	Templates.Template chosen() {
		return chosen;
	}
}
