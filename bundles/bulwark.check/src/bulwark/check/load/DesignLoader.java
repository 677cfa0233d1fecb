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
import bulwark.lang.design.Document;
import bulwark.lang.design.Library;
import bulwark.lang.design.Policy;
import bulwark.lang.diagnostics.FirstSyntaxErrors;
import bulwark.lang.install.Installation;
import bulwark.lang.library.LibraryPath;

/**
 * Parses and validates a design or a review policy with the language runtime. Each call uses a fresh resource set, so
 * calls from several threads do not interfere.
 */
public final class DesignLoader {
	private final Injector injector;
	private final Installation installation;

	/** @param installation where {@code use}d files are searched after the design's own folder */
	public DesignLoader(Injector injector, Installation installation) {
		this.injector = injector;
		this.installation = installation;
	}

	/** The installation designs are loaded for: its library folders, its documents. */
	public Installation installation() {
		return installation;
	}

	/** The language injector it parses with; completion asks the same one. */
	public Injector injector() {
		return injector;
	}

	public LoadedDesign load(String text, String file, CancelIndicator cancel) {
		Parsed parsed = parse(text, file, ".bulwark", cancel);
		Design design = parsed.root() instanceof Design d ? d : null;
		List<Issue> issues = parsed.issues();
		if (parsed.root() instanceof Policy) {
			issues = List.of(notA(file, "a review policy", "design"));
		} else if (parsed.root() instanceof Library) {
			issues = List.of(notA(file, "a parts library", "design"));
		}
		return new LoadedDesign(file, text, design, issues);
	}

	/** Parses and validates a review policy; the root is null when the text holds no policy. */
	public LoadedPolicy loadPolicy(String text, String file) {
		Parsed parsed = parse(text, file, ".bulwark-policy", CancelIndicator.NullImpl);
		if (parsed.root() instanceof Design) {
			return new LoadedPolicy(file, null, List.of(notA(file, "a design", "review policy")));
		}
		return new LoadedPolicy(file, parsed.root() instanceof Policy p ? p : null, parsed.issues());
	}

	private static Issue notA(String file, String is, String wanted) {
		Issue.IssueImpl issue = new Issue.IssueImpl();
		issue.setSeverity(org.eclipse.xtext.diagnostics.Severity.ERROR);
		issue.setMessage(file + " holds " + is + ", not a " + wanted);
		issue.setLineNumber(1);
		issue.setColumn(1);
		issue.setOffset(0);
		issue.setLength(0);
		return issue;
	}

	private record Parsed(Document root, List<Issue> issues) {
	}

	private Parsed parse(String text, String file, String extension, CancelIndicator cancel) {
		XtextResourceSet resourceSet = injector.getInstance(XtextResourceSet.class);
		LibraryPath.attach(resourceSet, installation.libraryFolders());
		URI uri = URI.createFileURI(file.endsWith(extension) ? file : file + extension);
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
		List<Issue> issues = FirstSyntaxErrors.of(resource,
				validator.validate(resource, CheckMode.ALL, cancel == null ? CancelIndicator.NullImpl : cancel));
		Document root = resource.getContents().isEmpty() ? null : (Document) resource.getContents().get(0);
		return new Parsed(root, issues);
	}
}
