package org.phasewright.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import org.phasewright.io.write.FrequencyInUnit;
import org.phasewright.io.write.ResultJson;
import org.phasewright.refine.RefinedFrequency;
import org.phasewright.refine.Refinement;

/**
 * The result JSON of an {@link Analysis}, built by io's {@link ResultJson} from the analysis' core
 * results: the least-squares fit with the shown standard errors and every warning, then the refined
 * frequencies (with the user's unit where one was given), the robust fit, the residual checks (with
 * the suggestion in words), the harmonic growth (with the options it ran with) and the term-by-term
 * comparison, each when present. This class only chooses which parts to hand over.
 */
final class AnalysisJson {

    private AnalysisJson() {
    }

    static ResultJson document(Analysis a, TermOptions terms) {
        LoadedRecord record = a.record();
        ResultJson doc = ResultJson.of(a.fit(), record.series()).shown(a.shown()).warnings(a.warnings());
        if (record.csv() != null) {
            doc.readBy(record.csv());
        } else if (record.wav() != null) {
            doc.readBy(record.wav());
        }
        doc.source(record.where());
        a.refinement().ifPresent(r -> doc.refinement(r, givenUnits(r, a.plan())));
        a.robust().ifPresent(doc::robust);
        if (a.residuals().isPresent()) {
            doc.diagnostics(a.residuals().get(), a.robust().isPresent() ? ResultJson.ROBUST_RESIDUALS
                    : ResultJson.LEAST_SQUARES_RESIDUALS, Suggestions.forResiduals(a));
        } else {
            doc.diagnosticsSkipped(a.noResidualChecks());
        }
        a.growth().ifPresent(g -> doc.harmonicGrowth(g, terms.growthSignificance(), terms.growthAllowMissing(),
                terms.harmonics.count()));
        a.comparison().ifPresent(doc::modelComparison);
        return doc;
    }

    /** The unit the user gave each refined frequency in, where it is not hertz, keyed by the refined term's label. */
    private static Map<String, FrequencyInUnit> givenUnits(Refinement r, ModelPlan plan) {
        Map<String, FrequencyInUnit> units = new LinkedHashMap<>();
        for (RefinedFrequency f : r.frequencies()) {
            plan.given(f.label()).filter(g -> !g.isHertz()).ifPresent(g -> units.put(f.label(), new InUnit(g)));
        }
        return units;
    }

    /** A frequency the user wrote, as the unit io repeats refined frequencies in. */
    private record InUnit(Frequency given) implements FrequencyInUnit {
        @Override
        public String unit() {
            return given.unit() == FrequencyUnit.PERIOD ? "period " + given.periodUnit() : given.unit().symbol();
        }

        @Override
        public double fromHertz(double hz) {
            return given.inUnit(hz);
        }

        @Override
        public double uncertaintyFromHertz(double hz, double seHz) {
            return given.uncertaintyInUnit(hz, seHz);
        }
    }
}
