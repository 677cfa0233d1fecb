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

import bulwark.lang.design.Design;

/** Every demo design survives parse → serialize → parse unchanged, so that fixes can edit the model. */
@ExtendWith(InjectionExtension.class)
@InjectWith(BulwarkInjectorProvider.class)
class RoundTripTest {
	@Inject
	private ParseHelper<Design> parser;
	@Inject
	private ISerializer serializer;
	@Inject
	private ValidationTestHelper validation;

	@Test
	void examplesRoundTrip() throws Exception {
		Path examples = Path.of(System.getProperty("bulwark.root", "../.."), "examples");
		List<Path> files;
		try (Stream<Path> s = Files.list(examples)) {
			files = s.filter(p -> p.toString().endsWith(".bulwark")).sorted().collect(Collectors.toList());
		}
		assertTrue(files.size() >= 4, "demo designs not found in " + examples.toAbsolutePath());
		for (Path file : files) {
			Design original = parser.parse(Files.readString(file));
			validation.assertNoErrors(original);
			String text = serializer.serialize(original);
			Design again = parser.parse(text);
			validation.assertNoErrors(again);
			assertTrue(EcoreUtil.equals(original, again), file + " changed in the round trip:\n" + text);
		}
	}
}
