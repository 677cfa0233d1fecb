package bulwark.lang.ide;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.resource.IResourceFactory;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;

import com.google.inject.Injector;

/** A text parsed as if it were the file it names (so that relative libraries resolve), without validation. */
public final class InMemoryResource {
	private InMemoryResource() {
	}

	public static XtextResource load(Injector injector, String text, String file) {
		XtextResourceSet set = injector.getInstance(XtextResourceSet.class);
		XtextResource resource = (XtextResource) injector.getInstance(IResourceFactory.class)
				.createResource(URI.createFileURI(file));
		set.getResources().add(resource);
		try {
			resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
					Map.of(XtextResource.OPTION_ENCODING, StandardCharsets.UTF_8.name()));
		} catch (IOException e) {
			throw new IllegalStateException(e); // reading from memory
		}
		return resource;
	}
}
