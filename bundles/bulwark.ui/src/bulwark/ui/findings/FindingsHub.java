package bulwark.ui.findings;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.BiConsumer;

import bulwark.check.DesignResult;
import bulwark.ui.editor.DesignEditor;

/**
 * Passes each editor's newest check result to the views that show it. Listeners are called on the UI thread.
 */
public final class FindingsHub {
	private static final List<BiConsumer<DesignEditor, DesignResult>> LISTENERS = new CopyOnWriteArrayList<>();
	private static volatile DesignEditor lastEditor;
	private static volatile DesignResult lastResult;

	private FindingsHub() {
	}

	public static void publish(DesignEditor editor, DesignResult result) {
		lastEditor = editor;
		lastResult = result;
		LISTENERS.forEach(l -> l.accept(editor, result));
	}

	/** Adds a listener and replays the newest result to it. */
	public static void subscribe(BiConsumer<DesignEditor, DesignResult> listener) {
		LISTENERS.add(listener);
		if (lastResult != null) {
			listener.accept(lastEditor, lastResult);
		}
	}

	public static void unsubscribe(BiConsumer<DesignEditor, DesignResult> listener) {
		LISTENERS.remove(listener);
	}
}
