package bulwark.ui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/** Saves what a shell shows on screen as PNG; used by the UI tests and the workbench's snapshot option. */
public final class Screenshot {
	private Screenshot() {
	}

	/** Must run on the UI thread. */
	public static void save(Shell shell, Path file) throws IOException {
		Display display = shell.getDisplay();
		while (display.readAndDispatch()) {
			// finish pending paints so that the picture shows the current state
		}
		Rectangle bounds = shell.getBounds();
		Image image = new Image(display, bounds.width, bounds.height);
		GC gc = new GC(display);
		try {
			gc.copyArea(image, bounds.x, bounds.y);
			Path parent = file.toAbsolutePath().getParent();
			Files.createDirectories(parent);
			ImageLoader loader = new ImageLoader();
			loader.data = new ImageData[] { image.getImageData() };
			loader.save(file.toString(), SWT.IMAGE_PNG);
		} finally {
			gc.dispose();
			image.dispose();
		}
	}
}
