package bulwark.lang.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.xtext.serializer.ISerializer;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;

import bulwark.lang.design.Document;

/**
 * Every demo design, policy and library survives parse → serialize → parse unchanged, so that fixes can edit
 * the model. Each is read at its own place, so that its {@code use} lines find their libraries.
 */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class RoundTripTest {
	@Inject
	private ParseHelper<Document> parser;
	@Inject
	private com.google.inject.Provider<org.eclipse.xtext.resource.XtextResourceSet> resourceSets;
	@Inject
	private ISerializer serializer;
	@Inject
	private ValidationTestHelper validation;

	@Test
	void examplesRoundTrip() throws Exception {
		Path examples = Path.of(System.getProperty("bulwark.root", "../.."), "examples");
		List<Path> files;
		try (Stream<Path> s = Files.walk(examples)) {
			files = s.filter(p -> p.toString().endsWith(".bulwark") || p.toString().endsWith(".bulwark-policy")).sorted()
					.collect(Collectors.toList());
		}
		assertTrue(files.size() >= 7, "demo designs, policies and library not found in " + examples.toAbsolutePath());
		for (Path file : files) {
			org.eclipse.emf.common.util.URI uri = org.eclipse.emf.common.util.URI
					.createFileURI(file.toAbsolutePath().toString());
			Document original = parser.parse(Files.readString(file), uri, resourceSets.get());
			validation.assertNoErrors(original);
			String text = serializer.serialize(original);
			Document again = parser.parse(text, uri, resourceSets.get());
			validation.assertNoErrors(again);
			assertTrue(EcoreUtil.equals(original, again), file + " changed in the round trip:\n" + text);
		}
	}
}
