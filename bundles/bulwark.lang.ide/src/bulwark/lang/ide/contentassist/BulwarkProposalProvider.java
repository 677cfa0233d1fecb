package bulwark.lang.ide.contentassist;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.ParserRule;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IIdeContentProposalAcceptor;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;

import bulwark.lang.design.Definition;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Setting;
import bulwark.lang.validation.RequirementValidator;
import bulwark.lang.kinds.KindCatalog;
import bulwark.lang.kinds.KindSpec;
import bulwark.lang.kinds.SettingSpec;
import bulwark.lang.units.Unit;

/**
 * Completion from the kind catalogue, besides the grammar's keywords and the nets and terminals in scope:
 * the pins a part of its kind still lacks, the parameters and ratings of its kind, and the units a slot
 * takes (with the usual prefixes).
 */
public class BulwarkProposalProvider extends IdeContentProposalProvider {
	private static final List<String> PREFIXES = List.of("", "m", "k", "M", "µ", "n", "p");

	@Override
	protected void _createProposals(Assignment assignment, ContentAssistContext context,
			IIdeContentProposalAcceptor acceptor) {
		String rule = EcoreUtil2.getContainerOfType(assignment, ParserRule.class).getName();
		String feature = assignment.getFeature();
		EObject model = context.getCurrentModel();
		Part part = EcoreUtil2.getContainerOfType(model, Part.class);
		Definition definition = EcoreUtil2.getContainerOfType(model, Definition.class);
		PartKind kind = part != null ? part.getKind() : definition != null ? definition.getKind() : null;
		if (kind != null && rule.equals("PinBinding") && feature.equals("pin") && part != null) {
			Set<String> bound = new HashSet<>();
			for (PinBinding b : part.getPins()) {
				bound.add(b.getPin());
			}
			for (String pin : KindCatalog.of(kind).pins()) {
				if (!bound.contains(pin)) {
					propose(pin + ": ", "pin of a " + KindCatalog.of(kind).kind(), context, acceptor);
				}
			}
			return;
		}
		if (kind != null && feature.equals("name") && (rule.equals("Parameter") || rule.equals("Rating"))) {
			KindSpec spec = KindCatalog.of(kind);
			for (SettingSpec s : rule.equals("Rating") ? spec.ratings() : spec.parameters()) {
				propose(s.name() + " ", s.meaning(), context, acceptor);
			}
			return;
		}
		if (rule.equals("Requirement") && feature.equals("what")) {
			RequirementValidator.FIGURES.values().stream().sorted(java.util.Comparator.comparing(RequirementValidator.Figure::name))
					.forEach(f -> propose(f.name() + " ", f.meaning(), context, acceptor));
			return;
		}
		if (rule.equals("Quantity") && feature.equals("unit")) {
			Setting setting = EcoreUtil2.getContainerOfType(model, Setting.class);
			Unit wanted = null;
			if (setting != null && kind != null) {
				KindSpec spec = KindCatalog.of(kind);
				wanted = (setting instanceof bulwark.lang.design.Rating ? spec.rating(setting.getName())
						: spec.parameter(setting.getName())).map(SettingSpec::unit).orElse(null);
			}
			for (Unit u : Unit.values()) {
				if (wanted == null || u == wanted) {
					for (String prefix : PREFIXES) {
						propose(prefix + u.symbol(), u.quantity(), context, acceptor);
					}
				}
			}
			return;
		}
		super._createProposals(assignment, context, acceptor);
	}

	private void propose(String text, String description, ContentAssistContext context,
			IIdeContentProposalAcceptor acceptor) {
		ContentAssistEntry entry = getProposalCreator().createProposal(text, context);
		if (entry != null) {
			entry.setDescription(description);
			acceptor.accept(entry, getProposalPriorities().getDefaultPriority(entry));
		}
	}
}
