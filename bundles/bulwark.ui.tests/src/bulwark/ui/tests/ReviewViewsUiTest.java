package bulwark.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static bulwark.ui.tests.Ui.ROOT;
import static bulwark.ui.tests.Ui.page;
import static bulwark.ui.tests.Ui.waitUntil;

import java.nio.file.Path;

import org.eclipse.swt.graphics.RGB;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;

import bulwark.ui.Application;
import bulwark.ui.Screenshot;
import bulwark.ui.editor.DesignEditor;
import bulwark.ui.stress.StressMapView;
import bulwark.ui.stress.UtilisationScale;
import bulwark.ui.sweep.SweepView;

/** The stress map and the threshold sweep follow the design being edited. */
class ReviewViewsUiTest {
	private static final Path MARINA = ROOT.resolve("examples/marina-bilge-switch-tester.bulwark");

	@Test
	void stressMapAndSweepShowTheDesign() throws Exception {
		var start = page().findView(bulwark.ui.start.StartView.ID);
		if (start != null) {
			page().hideView(start); // the pictures are of the review views
		}
		StressMapView map = (StressMapView) page().showView(StressMapView.ID);
		DesignEditor editor = Application.openFile(page(), MARINA);
		assertTrue(waitUntil(() -> editor.lastResult() != null && map.shownRows().stream().anyMatch(r -> r.part().equals("R_BASE"))),
				"the stress map does not show R_BASE");
		StressMapView.Row base = map.shownRows().stream().filter(r -> r.part().equals("R_BASE")).findFirst().orElseThrow();
		assertTrue(base.worst() > 0, base.toString());
		assertEquals(editor.lastResult().cases().size(), base.perCase().size());
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/stress-map.png"));
		bulwark.ui.findings.FindingsView findings = (bulwark.ui.findings.FindingsView) page()
				.showView(bulwark.ui.findings.FindingsView.ID);
		page().activate(editor);
		assertTrue(waitUntil(() -> findings.shownFindings() != null && !findings.shownFindings().isEmpty()));
		findings.filter("error", "reverse-path");
		assertTrue(!findings.visibleFindings().isEmpty()
				&& findings.visibleFindings().stream().allMatch(f -> f.concern().id().equals("reverse-path")));
		findings.filter("all", "all");
		bulwark.ui.cases.CasesView cases = (bulwark.ui.cases.CasesView) page().showView(bulwark.ui.cases.CasesView.ID);
		page().activate(editor);
		page().showView(bulwark.ui.cases.CasesView.ID);
		assertTrue(waitUntil(() -> cases.shownCases() != null && cases.shownCases().size() == editor.lastResult().cases().size()
				&& !cases.shownCases().isEmpty()), "the cases view does not list the cases");
		bulwark.ui.topology.TopologyView topology = (bulwark.ui.topology.TopologyView) page()
				.showView(bulwark.ui.topology.TopologyView.ID);
		page().activate(editor);
		page().showView(bulwark.ui.topology.TopologyView.ID);
		assertTrue(waitUntil(() -> topology.shownDrawing() != null), "no topology drawn");
		var boxes = topology.shownDrawing().boxes();
		assertTrue(boxes.stream().anyMatch(b -> b.name().equals("R_BASE") && b.kind().equals("resistor")), boxes.toString());
		// terminals in the first layer: left of every part
		double terminalX = boxes.stream().filter(b -> b.kind().equals("terminal")).mapToDouble(b -> b.x()).max().orElseThrow();
		double partX = boxes.stream().filter(b -> b.kind().equals("resistor")).mapToDouble(b -> b.x()).min().orElseThrow();
		assertTrue(terminalX < partX, "terminals on the left");
		var reverse = editor.lastResult().findings().stream().filter(f -> f.rule().text().equals("reverse-path")).findFirst().orElseThrow();
		topology.highlight(reverse);
		var path = bulwark.check.rules.ReversePathRule.pathOf(reverse);
		assertTrue(topology.highlighted().containsAll(path) && topology.highlighted().contains("net gnd"), topology.highlighted().toString());
		String svg = topology.svg();
		var xml = javax.xml.parsers.DocumentBuilderFactory.newInstance().newDocumentBuilder()
				.parse(new java.io.ByteArrayInputStream(svg.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
		assertEquals("svg", xml.getDocumentElement().getTagName());
		assertTrue(svg.contains("data-name=\"R_BASE\"") && svg.contains("#6a1b9a"), "the part and the highlighted path are drawn");
		java.nio.file.Files.writeString(ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/topology.svg"), svg);
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/topology.png"));
		SweepView sweep = (SweepView) page().showView(SweepView.ID);
		page().activate(editor);
		page().showView(SweepView.ID);
		assertTrue(waitUntil(() -> sweep.shownPair() != null), "no sweep drawn");
		assertEquals("TIP", sweep.shownPair().from());
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/threshold-sweep.png"));
		double[] full = sweep.shownOhms();
		sweep.zoomToSwitching();
		double[] zoomed = sweep.shownOhms();
		double rising = sweep.shownPair().risingOhms();
		assertTrue(zoomed[0] <= rising && rising <= zoomed[1] && zoomed[1] / zoomed[0] < full[1] / full[0] / 10,
				java.util.Arrays.toString(zoomed) + " of " + java.util.Arrays.toString(full));
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/threshold-sweep-zoomed.png"));
		sweep.resetZoom();
		assertEquals(full[0], sweep.shownOhms()[0], full[0] * 1e-12);
	}

	@Test
	void theWaveformOfAMainsCaseIsDrawn() throws Exception {
		var waveform = (bulwark.ui.waveform.WaveformView) page().showView(bulwark.ui.waveform.WaveformView.ID);
		DesignEditor editor = Application.openFile(page(), ROOT.resolve("examples/socket-live-indicator.bulwark"));
		page().showView(bulwark.ui.waveform.WaveformView.ID);
		assertTrue(waitUntil(() -> editor.lastResult() != null && waveform.shownTrace() != null), "no waveform drawn");
		assertEquals(editor.lastResult().waveforms().size(), waveform.traces().size());
		var trace = waveform.shownTrace();
		// one steady cycle of 50 Hz mains, resampled for the plot
		assertEquals(bulwark.check.WaveformTrace.SAMPLES, trace.seconds().length);
		assertEquals(0.020, trace.seconds()[trace.seconds().length - 1], 0.020 * 0.01);
		assertTrue(editor.lastResult().stresses().stream().anyMatch(s -> s.part().equals(trace.part())), trace.part());
		assertTrue(java.util.Arrays.stream(trace.volts()).anyMatch(v -> Math.abs(v) > 1), "a flat trace");
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/waveform.png"));
	}

	@Test
	void aQuickFixThroughTheCtrl1Api() throws Exception {
		Path dir = java.nio.file.Files.createTempDirectory("bulwark-fix");
		Path lab = dir.resolve("lab.bulwark");
		java.nio.file.Files.copy(ROOT.resolve("examples/lab-indicator-seeded.bulwark"), lab);
		java.nio.file.Files.copy(ROOT.resolve("examples/teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		DesignEditor editor = Application.openFile(page(), lab);
		assertTrue(waitUntil(() -> editor.lastResult() != null
				&& editor.lastResult().findings().stream().anyMatch(f -> f.rule().text().equals("resistor-power"))));
		var fixes = editor.fixProposals().fixesAt(22);
		assertEquals("raise R_DROP's rated power 125 mW → 2 W (1280 % → 80 % of the limit)", fixes.get(0).label());
		editor.fixProposals().apply(fixes.get(0));
		assertTrue(waitUntil(() -> editor.lastResult().findings().stream().noneMatch(f -> f.rule().text().equals("resistor-power"))),
				"the finding stays after its fix");
		assertTrue(editor.isDirty());
	}

	@Test
	void aWaiverFromAFinding() throws Exception {
		Path dir = java.nio.file.Files.createTempDirectory("bulwark-waive");
		Path lab = dir.resolve("lab.bulwark");
		java.nio.file.Files.copy(ROOT.resolve("examples/lab-indicator-seeded.bulwark"), lab);
		java.nio.file.Files.copy(ROOT.resolve("examples/teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		bulwark.ui.findings.FindingsView findings = (bulwark.ui.findings.FindingsView) page()
				.showView(bulwark.ui.findings.FindingsView.ID);
		DesignEditor editor = Application.openFile(page(), lab);
		assertTrue(waitUntil(() -> findings.shownFindings() != null
				&& findings.shownFindings().stream().anyMatch(f -> f.rule().text().equals("resistor-power"))));
		var finding = findings.shownFindings().stream().filter(f -> f.rule().text().equals("resistor-power")).findFirst().orElseThrow();
		// the dialogs name the finding, and warn first: R_DROP is at 1280 % of its limit, more than ten times over
		assertTrue(bulwark.ui.findings.WaivePrompt.why(finding).contains(finding.message()));
		assertEquals("R_DROP is at 1280 % of its limit, more than 10 times over. A waiver says the part survives this;"
				+ " a part that far over its rating is usually a design to change. Waive it all the same?",
				bulwark.ui.findings.WaivePrompt.farOver(finding).orElseThrow());
		findings.waive(finding, "the \"lamp\" test lasts 10 ms", "A. Reviewer");
		assertTrue(waitUntil(() -> editor.lastResult().findings().stream()
				.anyMatch(f -> f.rule().text().equals("resistor-power") && f.waived())), "the finding is not waived");
		assertEquals(bulwark.check.Status.PASS, editor.lastResult().status());
	}

	@Test
	void aReviewPolicyOpensWithItsProblemsMarked() throws Exception {
		Path dir = java.nio.file.Files.createTempDirectory("bulwark-policy");
		Path policy = dir.resolve("team.bulwark-policy");
		java.nio.file.Files.writeString(policy, "policy \"team\"\n  mains 230 V ± 10 %\n  severity \"no-such-rule\" error\n");
		DesignEditor editor = Application.openFile(page(), policy);
		assertTrue(waitUntil(() -> editor.lastResult() != null && !editor.findingAnnotations().isEmpty()),
				"no problem marked in the policy");
		assertEquals(2, editor.lineOf(editor.findingAnnotations().get(0)), "on the severity line");
		assertTrue(editor.lastResult().findings().get(0).message().contains("no rule Bulwark has"));
	}

	@Test
	void theOutlineListsTheDeclarations() throws Exception {
		DesignEditor editor = Application.openFile(page(), MARINA);
		var outline = (bulwark.ui.outline.DesignOutline) editor.getAdapter(org.eclipse.ui.views.contentoutline.IContentOutlinePage.class);
		var entries = bulwark.ui.outline.DesignOutline.entries(editor.getDocumentProvider().getDocument(editor.getEditorInput()).get());
		assertTrue(entries.stream().anyMatch(e -> e.kind().equals("resistor") && e.name().equals("R_BASE")), entries.toString());
		assertTrue(entries.stream().anyMatch(e -> e.kind().equals("reference net") && e.name().equals("gnd")), entries.toString());
		assertTrue(entries.stream().anyMatch(e -> e.kind().equals("require") && e.name().equals("threshold")), entries.toString());
		assertTrue(outline != null);
	}

	@Test
	void helpOpensTheUserGuide() throws Exception {
		org.eclipse.ui.handlers.IHandlerService handlers = PlatformUI.getWorkbench().getActiveWorkbenchWindow()
				.getService(org.eclipse.ui.handlers.IHandlerService.class);
		handlers.executeCommand("bulwark.ui.help.user-guide", null);
		assertEquals("user-guide.md", page().getActiveEditor().getTitle());
	}

	@Test
	void aPolicyWithErrorsIsRefusedAndTheCheckerKept() throws Exception {
		Path bad = java.nio.file.Files.createTempFile("bad", ".bulwark-policy");
		java.nio.file.Files.writeString(bad, "policy \"bad\"\n  derate resistor power to 0 %\n");
		var before = bulwark.ui.BulwarkUi.checker();
		assertTrue(!bulwark.ui.BulwarkUi.usePolicy(bad).isEmpty());
		assertTrue(before == bulwark.ui.BulwarkUi.checker(), "a refused policy leaves the checker as it was");
	}

	@Test
	void completionOffersThePinsOfTheKind() throws Exception {
		DesignEditor editor = Application.openFile(page(), MARINA);
		var processor = new bulwark.ui.editor.CompletionProcessor(editor);
		String text = "design \"probe\"\nreference net gnd\nnet a\nled D1 (";
		var labels = processor.entriesAt(text, text.length()).stream().map(e -> e.getProposal()).toList();
		assertTrue(labels.contains("anode: ") && labels.contains("cathode: "), labels.toString());
		assertTrue(editor.getAction("ContentAssistProposal") != null, "Ctrl+Space is bound in the editor");
	}

	@Test
	void blocksAndCommentRunsFold() throws Exception {
		String text = """
				# one
				# two
				# three
				design "a { b"
				resistor R1 (a: x, b: y) { value 1 kΩ }
				resistor R2 (a: x, b: y) {
				  value 1 kΩ # not a } brace
				}
				""";
		var regions = bulwark.ui.editor.FoldRegions.of(text);
		assertEquals(2, regions.size(), regions.toString()); // the comment run and R2's block
		assertEquals(0, regions.get(0).getOffset());
		assertEquals(text.indexOf("design"), regions.get(0).getLength());
		assertEquals(text.indexOf("resistor R2"), regions.get(1).getOffset());
		assertEquals(text.length(), regions.get(1).getOffset() + regions.get(1).getLength());
		DesignEditor editor = Application.openFile(page(), MARINA);
		String marina = editor.getDocumentProvider().getDocument(editor.getEditorInput()).get();
		assertEquals(bulwark.ui.editor.FoldRegions.of(marina), editor.foldRegions());
		// the opening comment, and the blocks of B1, R_OFF, R_BASE, R_LED, D1 and Z1 (Q1 is one line)
		assertEquals(7, editor.foldRegions().size(), editor.foldRegions().toString());
		// semantic highlighting: R_BASE's declaration in the part colour, bold; a net reference in the net colour
		assertTrue(waitUntil(() -> !editor.semanticRanges().isEmpty()), "no names classified");
		var widget = (org.eclipse.swt.custom.StyledText) editor.getAdapter(org.eclipse.swt.widgets.Control.class);
		var part = widget.getStyleRangeAtOffset(marina.indexOf("R_BASE (") + 1);
		assertEquals(new RGB(32, 44, 124), part.foreground.getRGB());
		assertTrue((part.fontStyle & org.eclipse.swt.SWT.BOLD) != 0);
		var net = widget.getStyleRangeAtOffset(marina.indexOf("(a: base") + 4);
		assertEquals(new RGB(0, 118, 88), net.foreground.getRGB());
	}

	@Test
	void aToleranceRunInTheBackground() throws Exception {
		DesignEditor editor = Application.openFile(page(), MARINA);
		var view = (bulwark.ui.tolerance.ToleranceView) page().showView(bulwark.ui.tolerance.ToleranceView.ID);
		view.run(editor, 200);
		assertTrue(waitUntil(() -> view.result() != null), "the tolerance run did not finish");
		var rows = view.shownRows();
		assertTrue(rows.stream().anyMatch(r -> r.figure().name().startsWith("threshold") && r.corners() != null
				&& r.statistics() != null && r.corners().low() <= r.statistics().p50() && r.statistics().p50() <= r.corners().high()),
				rows.toString()); // the samples lie inside the corners [extreme-value analysis bounds every sample]
		assertEquals(200, view.result().monteCarlo().samples().size());
		assertTrue(view.result().yields().stream().anyMatch(y -> y.requirement().startsWith("require threshold")));
		Screenshot.save(PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(),
				ROOT.resolve("bundles/bulwark.ui.tests/target/screenshots/tolerance.png"));
		Path report = java.nio.file.Files.createTempDirectory("bulwark-tolerance").resolve("tolerance.html");
		view.save(report);
		assertTrue(java.nio.file.Files.readString(report).contains("IEC 61010-1"));
	}

	@Test
	void ticksGrowDenserAsTheAxisIsZoomed() {
		// log10 positions: 1 Ω … 1 MΩ every decade; 1 kΩ … 3 kΩ in 1-2 steps plus every mantissa below 0.6 decade
		assertEquals(java.util.List.of(0.0, 1.0, 2.0, 3.0, 4.0, 5.0, 6.0), bulwark.ui.sweep.AxisTicks.logarithmic(0, 6.0 - 1e-12));
		assertEquals(java.util.List.of(0.0, 2.0, 4.0, 6.0, 8.0), bulwark.ui.sweep.AxisTicks.logarithmic(0, 8));
		var fine = bulwark.ui.sweep.AxisTicks.logarithmic(3, 3.5);
		assertEquals(3, fine.size(), fine.toString()); // 1 k, 2 k, 3 k
		assertEquals(Math.log10(3000), fine.get(2), 1e-12);
	}

	@Test
	void theScaleRunsFromCoolToWarmToDark() {
		RGB cool = UtilisationScale.of(0), limit = UtilisationScale.of(1), over = UtilisationScale.of(2);
		assertTrue(cool.blue > cool.red, cool.toString());
		assertTrue(limit.red > limit.blue, limit.toString());
		float[] a = limit.getHSB(), b = over.getHSB();
		assertTrue(b[2] < a[2], "darker beyond the limit");
	}
}
