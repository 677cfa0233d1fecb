package bulwark.ui.start;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;

/** File > Start Page: the demo designs, templates and help again. */
public class ShowStart extends AbstractHandler {

	@Override
	public Object execute(ExecutionEvent event) throws ExecutionException {
		try {
			HandlerUtil.getActiveWorkbenchWindowChecked(event).getActivePage().showView(StartView.ID);
		} catch (PartInitException e) {
			throw new ExecutionException("cannot show the start page", e);
		}
		return null;
	}
}
