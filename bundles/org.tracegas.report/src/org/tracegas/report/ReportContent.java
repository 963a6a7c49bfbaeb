package org.tracegas.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracegas.audit.Signature;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.qa.checks.MethodDetectionLimit;
import org.tracegas.report.internal.Check;
import org.tracegas.report.internal.ContentDigest;

/**
 * Everything a campaign report shows, as an immutable value built from plain data. Signatures and the audit
 * anchor are not part of the {@link #contentHash() content hash}: signatures sign it, and the anchor moves with
 * every new audit record.
 */
public final class ReportContent {

    private final Campaign campaign;
    private final List<MethodVersion> methods;
    private final List<LibraryVersion> libraries;
    private final List<QaLine> qa;
    private final List<MethodDetectionLimit> detectionLimits;
    private final List<Plot> controlCharts;
    private final List<UncertaintyTable> budgets;
    private final List<ResultRow> results;
    private final List<String> averagingRules;
    private final List<Plot> timeSeries;
    private final List<SpectrumFit> spectra;
    private final List<String> cautions;
    /** The instruments that made the reported measurements, one line each; none where the workspace names none. */
    private final List<String> instruments;
    private final List<Signature> signatures;
    private final AuditAnchor auditAnchor;
    private final byte[] canonical;
    private final String contentHash;

    private ReportContent(Builder b) {
        campaign = Check.notNull("campaign", b.campaign);
        if (!campaign.placed()) {
            throw new IllegalArgumentException("campaign: the plant and the emission source must be named");
        }
        methods = Check.list("methods", b.methods);
        libraries = Check.list("libraries", b.libraries);
        qa = Check.list("qa", b.qa);
        detectionLimits = Check.list("detectionLimits", b.detectionLimits);
        controlCharts = Check.list("controlCharts", b.controlCharts);
        budgets = Check.list("budgets", b.budgets);
        results = Check.list("results", b.results);
        averagingRules = Check.list("averagingRules", b.averagingRules);
        timeSeries = Check.list("timeSeries", b.timeSeries);
        spectra = Check.list("spectra", b.spectra);
        cautions = Check.list("cautions", b.cautions);
        instruments = Check.list("instruments", b.instruments);
        signatures = Check.list("signatures", b.signatures);
        auditAnchor = b.auditAnchor;
        ContentDigest d = digest();
        canonical = d.bytes();
        contentHash = d.hex();
    }

    public static Builder builder(Campaign campaign) {
        return new Builder(campaign);
    }

    public Campaign campaign() {
        return campaign;
    }

    public List<MethodVersion> methods() {
        return methods;
    }

    public List<LibraryVersion> libraries() {
        return libraries;
    }

    public List<QaLine> qa() {
        return qa;
    }

    /** Control charts of repeated QA readings. */
    /** The method detection limits of the compounds, from the replicate zero-gas readings. */
    public List<MethodDetectionLimit> detectionLimits() {
        return detectionLimits;
    }

    public List<Plot> controlCharts() {
        return controlCharts;
    }

    /** Uncertainty budgets behind the expanded uncertainties of the results. */
    public List<UncertaintyTable> budgets() {
        return budgets;
    }

    public List<ResultRow> results() {
        return results;
    }

    /**
     * The rules the averages were made by, each with its source: validity of a period, treatment of values below
     * the detection limit, what was excluded.
     */
    public List<String> averagingRules() {
        return averagingRules;
    }

    public List<Plot> timeSeries() {
        return timeSeries;
    }

    public List<SpectrumFit> spectra() {
        return spectra;
    }

    /** Cautions beyond the standard ones every report carries. */
    public List<String> cautions() {
        return cautions;
    }

    /** The instruments that made the reported measurements, one line each (name, serial and figures). */
    public List<String> instruments() {
        return instruments;
    }

    public List<Signature> signatures() {
        return signatures;
    }

    /** The signatures of one meaning, in the order added; those on other content included. */
    public List<Signature> signatures(SignatureMeaning meaning) {
        return signatures.stream().filter(s -> s.meaning() == meaning).toList();
    }

    /** The audit chain's last record when the report was made, if known. */
    public Optional<AuditAnchor> auditAnchor() {
        return Optional.ofNullable(auditAnchor);
    }

    /** SHA-256 (hex) of the {@link #canonicalContent() canonical content}. */
    public String contentHash() {
        return contentHash;
    }

    /**
     * All content except the signatures and the audit anchor as canonical bytes: every field in a fixed order,
     * each preceded by its length. This is what a signature signs.
     */
    public byte[] canonicalContent() {
        return canonical.clone();
    }

    /** The same content with the audit anchor taken when the report was made. */
    public ReportContent withAuditAnchor(AuditAnchor anchor) {
        Builder b = toBuilder();
        b.auditAnchor = Check.notNull("anchor", anchor);
        return b.build();
    }

    /**
     * The same content with one more signature.
     *
     * @param signature a review or approval signature ({@link SignatureWords#PRINTED})
     * @throws IllegalArgumentException when the signature is null or of a meaning the report does not print
     */
    public ReportContent withSignature(Signature signature) {
        Builder b = toBuilder();
        b.signature(signature);
        return b.build();
    }

    /** The same content stating the instruments that made its measurements, one line each. */
    public ReportContent withInstruments(List<String> lines) {
        Builder b = toBuilder();
        b.instruments.clear();
        lines.forEach(b::instrument);
        return b.build();
    }

    private Builder toBuilder() {
        Builder b = new Builder(campaign);
        b.methods.addAll(methods);
        b.libraries.addAll(libraries);
        b.qa.addAll(qa);
        b.detectionLimits.addAll(detectionLimits);
        b.controlCharts.addAll(controlCharts);
        b.budgets.addAll(budgets);
        b.results.addAll(results);
        b.averagingRules.addAll(averagingRules);
        b.timeSeries.addAll(timeSeries);
        b.spectra.addAll(spectra);
        b.cautions.addAll(cautions);
        b.instruments.addAll(instruments);
        b.signatures.addAll(signatures);
        b.auditAnchor = auditAnchor;
        return b;
    }

    // fields one by one rather than record toString(), whose format the platform does not fix
    private ContentDigest digest() {
        Campaign c = campaign;
        ContentDigest d = new ContentDigest().add(c.reportId()).add(c.client()).add(c.plant()).add(c.source())
                .add(c.firstDay()).add(c.lastDay()).add(c.issued()).add(c.reportingBasis());
        // only where stated, so that a report of measurements without a recorded instrument keeps its hash
        if (!instruments.isEmpty()) {
            d.add("instruments").add(instruments.size());
            instruments.forEach(d::add);
        }
        d.add(methods.size());
        methods.forEach(m -> d.add(m.name()).add(m.version()).add(m.hash()));
        d.add(libraries.size());
        libraries.forEach(l -> d.add(l.name()).add(l.version()));
        d.add(qa.size());
        qa.forEach(q -> d.add(q.check()).add(q.passed()).add(q.measured()).add(q.limits()).add(q.rule())
                .add(q.source()));
        d.add(detectionLimits.size());
        detectionLimits.forEach(l -> d.add(l.analyte()).add(l.readings()).add(l.standardDeviation()).add(l.t())
                .add(l.minimumAnalyteUncertainty()));
        d.add(controlCharts.size());
        controlCharts.forEach(p -> digestPlot(d, p));
        d.add(budgets.size());
        for (UncertaintyTable t : budgets) {
            d.add(t.title()).add(t.value()).add(t.unit()).add(t.combined()).add(t.coverage()).add(t.expanded())
                    .add(t.rows().size());
            t.rows().forEach(r -> d.add(r.name()).add(r.estimate()).add(r.standardUncertainty()).add(r.unit())
                    .add(r.sensitivity()).add(r.contribution()).add(r.sharePercent()));
        }
        d.add(results.size());
        for (ResultRow r : results) {
            d.add(r.compound()).add(r.period()).add(r.periodStart()).add(r.value()).add(r.expandedUncertainty())
                    .add(r.unit()).add(r.flags().size());
            r.flags().forEach(d::add);
            d.add(r.limit().isPresent() ? Double.toString(r.limit().getAsDouble()) : "none").add(r.status().name())
                    .add(r.cellCorrection());
        }
        d.add(averagingRules.size());
        averagingRules.forEach(d::add);
        d.add(timeSeries.size());
        for (Plot p : timeSeries) {
            digestPlot(d, p);
        }
        d.add(spectra.size());
        for (SpectrumFit s : spectra) {
            d.add(s.title()).add(s.wavenumbers()).add(s.measured()).add(s.fitted());
        }
        d.add(cautions.size());
        cautions.forEach(d::add);
        return d;
    }

    private static void digestPlot(ContentDigest d, Plot p) {
        d.add(p.title()).add(p.xLabel()).add(p.yLabel()).add(p.reversedX()).add(p.series().size());
        for (Series s : p.series()) {
            d.add(s.name()).add(s.pointsOnly()).add(s.x()).add(s.y());
        }
        d.add(p.levels().size());
        p.levels().forEach(l -> d.add(l.name()).add(l.value()));
    }

    /** Collects the parts of a report; lists keep the order they are added in. */
    public static final class Builder {
        private final Campaign campaign;
        private final List<MethodVersion> methods = new ArrayList<>();
        private final List<LibraryVersion> libraries = new ArrayList<>();
        private final List<QaLine> qa = new ArrayList<>();
        private final List<MethodDetectionLimit> detectionLimits = new ArrayList<>();
        private final List<Plot> controlCharts = new ArrayList<>();
        private final List<UncertaintyTable> budgets = new ArrayList<>();
        private final List<ResultRow> results = new ArrayList<>();
        private final List<String> averagingRules = new ArrayList<>();
        private final List<Plot> timeSeries = new ArrayList<>();
        private final List<SpectrumFit> spectra = new ArrayList<>();
        private final List<String> cautions = new ArrayList<>();
        private final List<String> instruments = new ArrayList<>();
        private final List<Signature> signatures = new ArrayList<>();
        private AuditAnchor auditAnchor;

        private Builder(Campaign campaign) {
            this.campaign = campaign;
        }

        public Builder method(MethodVersion m) {
            methods.add(m);
            return this;
        }

        public Builder library(LibraryVersion l) {
            libraries.add(l);
            return this;
        }

        public Builder qa(QaLine line) {
            qa.add(line);
            return this;
        }

        /** The method detection limit and minimum analyte uncertainty of a compound, for their table. */
        public Builder detectionLimit(MethodDetectionLimit limit) {
            detectionLimits.add(Check.notNull("limit", limit));
            return this;
        }

        public Builder controlChart(Plot chart) {
            controlCharts.add(chart);
            return this;
        }

        public Builder budget(UncertaintyTable table) {
            budgets.add(table);
            return this;
        }

        public Builder result(ResultRow row) {
            results.add(row);
            return this;
        }

        /** A rule the averages were made by, with its source; each distinct text is kept once. */
        public Builder averagingRule(String text) {
            Check.text("averaging rule", text);
            if (!averagingRules.contains(text)) {
                averagingRules.add(text);
            }
            return this;
        }

        public Builder timeSeries(Plot plot) {
            timeSeries.add(plot);
            return this;
        }

        public Builder spectrum(SpectrumFit fit) {
            spectra.add(fit);
            return this;
        }

        public Builder caution(String text) {
            cautions.add(Check.text("caution", text));
            return this;
        }

        public Builder instrument(String line) {
            instruments.add(Check.text("instrument", line));
            return this;
        }

        /** @throws IllegalArgumentException when {@code s} is null or of a meaning the report does not print */
        public Builder signature(Signature s) {
            SignatureWords.require(Check.notNull("signature", s).meaning());
            signatures.add(s);
            return this;
        }

        public ReportContent build() {
            return new ReportContent(this);
        }
    }
}
