package bulwark.check.compile;

import java.util.List;

/** The cases a design is checked under. For now the normal condition; abuse cases join it later. */
public final class CaseGenerator {
	private CaseGenerator() {
	}

	public static List<FaultCase> cases(CompiledDesign design) {
		return List.of(FaultCase.normalOpen());
	}
}
