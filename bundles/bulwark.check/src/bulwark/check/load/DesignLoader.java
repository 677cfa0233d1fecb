package bulwark.check.load;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.resource.IResourceFactory;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.IResourceValidator;
import org.eclipse.xtext.validation.Issue;

import com.google.inject.Injector;

import bulwark.lang.design.Design;

/**
 * Parses and validates a design text with the language runtime. Each call uses a fresh resource set, so
 * calls from several threads do not interfere.
 */
public final class DesignLoader {
	private final Injector injector;

	public DesignLoader(Injector injector) {
		this.injector = injector;
	}

	public LoadedDesign load(String text, String file, CancelIndicator cancel) {
		XtextResourceSet resourceSet = injector.getInstance(XtextResourceSet.class);
		URI uri = URI.createFileURI(file.endsWith(".bulwark") ? file : file + ".bulwark");
		XtextResource resource = (XtextResource) injector.getInstance(IResourceFactory.class).createResource(uri);
		resourceSet.getResources().add(resource);
		try {
			resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)),
					Map.of(XtextResource.OPTION_ENCODING, StandardCharsets.UTF_8.name()));
		} catch (IOException e) {
			// reading from memory cannot fail; keep the cause if it ever does
			throw new IllegalStateException(e);
		}
		IResourceValidator validator = resource.getResourceServiceProvider().getResourceValidator();
		List<Issue> issues = validator.validate(resource, CheckMode.ALL,
				cancel == null ? CancelIndicator.NullImpl : cancel);
		Design design = resource.getContents().isEmpty() ? null : (Design) resource.getContents().get(0);
		return new LoadedDesign(file, text, design, issues);
	}
}
