package bulwark.ui.outline;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.views.contentoutline.ContentOutlinePage;

import bulwark.ui.editor.DesignEditor;

/**
 * The outline of a design: its nets, terminals, parts, cases and requirements in the order written, read from
 * the text's declarations; selecting one selects its name in the editor. Refreshed after each check.
 */
public class DesignOutline extends ContentOutlinePage {
	/** One declaration: what it is, its name, where the name is. */
	public record Entry(String kind, String name, int offset) {
		@Override
		public String toString() {
			return kind + " " + name;
		}
	}

	private static final Pattern DECLARATION = Pattern.compile(
			"(?m)^\\s*(reference\\s+net|net|terminal|resistor|source|battery|diode|zener|led|npn|pnp|nmos|pmos|comparator"
					+ "|capacitor|inductor|potentiometer|protector|fuse|resettable_fuse|indicator|current_source|link|define\\s+\\w+|case|require)"
					+ "\\s+(\\^?\\w+|\"[^\"]*\")");
	private static final Pattern COMMENT = Pattern.compile("#[^\\n]*");
	private final DesignEditor editor;

	public DesignOutline(DesignEditor editor) {
		this.editor = editor;
	}

	/** The declarations of a text, in order (comments are skipped line by line). */
	public static List<Entry> entries(String text) {
		List<Entry> entries = new ArrayList<>();
		// comments blanked out, offsets kept
		String code = COMMENT.matcher(text).replaceAll(r -> " ".repeat(r.group().length()));
		Matcher m = DECLARATION.matcher(code);
		while (m.find()) {
			entries.add(new Entry(m.group(1).replaceAll("\\s+", " "), m.group(2), m.start(2)));
		}
		return entries;
	}

	@Override
	public void createControl(Composite parent) {
		super.createControl(parent);
		TreeViewer viewer = getTreeViewer();
		viewer.setContentProvider(new org.eclipse.jface.viewers.ITreeContentProvider() {
			@Override
			public Object[] getElements(Object input) {
				return ArrayContentProvider.getInstance().getElements(input);
			}

			@Override
			public Object[] getChildren(Object parentElement) {
				return new Object[0];
			}

			@Override
			public Object getParent(Object element) {
				return null;
			}

			@Override
			public boolean hasChildren(Object element) {
				return false;
			}
		});
		viewer.setLabelProvider(new LabelProvider());
		viewer.addSelectionChangedListener(e -> {
			Object o = ((IStructuredSelection) e.getSelection()).getFirstElement();
			if (o instanceof Entry entry) {
				editor.selectAndReveal(entry.offset(), entry.name().length());
			}
		});
		refresh();
	}

	/** Reads the declarations again from the editor's text. */
	public void refresh() {
		TreeViewer viewer = getTreeViewer();
		if (viewer == null || viewer.getControl().isDisposed()) {
			return;
		}
		viewer.setInput(entries(editor.getDocumentProvider().getDocument(editor.getEditorInput()).get()));
	}
}
