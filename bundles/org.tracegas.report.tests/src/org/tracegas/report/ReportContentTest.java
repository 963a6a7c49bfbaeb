package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracegas.audit.SignatureMeaning;
import org.tracegas.qa.checks.MethodDetectionLimit;

class ReportContentTest {

    @Test
    void hashIgnoresSignaturesButNotContent() {
        ReportContent unsigned = CampaignFixture.unsigned().build();
        ReportContent reviewed = CampaignFixture.reviewed();
        assertEquals(unsigned.contentHash(), reviewed.contentHash());
        assertEquals(64, unsigned.contentHash().length());
        assertNotEquals(unsigned.contentHash(), CampaignFixture.unsigned().caution("extra").build().contentHash());
        assertEquals(1, reviewed.signatures(SignatureMeaning.REVIEWED).size());
        assertTrue(reviewed.signatures(SignatureMeaning.APPROVED).isEmpty());
    }

    @Test
    void theInstrumentsAreSignedContentWhereStatedAndAContentWithoutThemKeepsItsHash() {
        ReportContent plain = CampaignFixture.unsigned().build();
        assertEquals(plain.contentHash(), plain.withInstruments(List.of()).contentHash());
        ReportContent stated = plain.withInstruments(List.of("Bench analyzer, serial TB-0007: reference laser"
                + " 15798 cm-1, maximum path difference 0.5 cm, field of view not recorded, cell path length 6.4 m"));
        assertNotEquals(plain.contentHash(), stated.contentHash(), "the instrument is part of what is signed");
        assertEquals(1, stated.instruments().size());
        assertEquals(stated.instruments(), stated.withSignature(CampaignFixture.signature("B. Second", Instant.EPOCH,
                SignatureMeaning.REVIEWED, stated.contentHash())).instruments());
        assertThrows(IllegalArgumentException.class, () -> plain.withInstruments(List.of(" ")));
        Campaign unplaced = new Campaign("R-1", "Client", null, null, plain.campaign().firstDay(),
                plain.campaign().lastDay(), plain.campaign().issued(), plain.campaign().reportingBasis());
        assertTrue(assertThrows(IllegalArgumentException.class, () -> ReportContent.builder(unplaced).build())
                .getMessage().contains("plant"));
    }

    @Test
    void signaturesOnEarlierContentAreKeptBesideTheCurrentOne() {
        ReportContent reviewed = CampaignFixture.reviewed();
        ReportContent twice = reviewed.withSignature(CampaignFixture.signature("B. Second", Instant.EPOCH,
                SignatureMeaning.REVIEWED, CampaignFixture.sha256("an earlier issue")));
        assertEquals(2, twice.signatures(SignatureMeaning.REVIEWED).size());
        assertEquals(reviewed.contentHash(), twice.contentHash());
    }

    @Test
    void theContentHashIsTheSha256OfTheCanonicalContent() throws Exception {
        ReportContent c = CampaignFixture.unsigned().build();
        // SHA-256 of the bytes a signer signs (FIPS 180-4 via the platform's MessageDigest)
        String sha = java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(c.canonicalContent()));
        assertEquals(sha, c.contentHash());
        assertTrue(java.util.Arrays.equals(c.canonicalContent(), CampaignFixture.unsigned().build()
                .canonicalContent()), "the same content gives the same bytes");
    }

    @Test
    void detectionLimitsAreContentAndEverythingSurvivesSigning() {
        MethodDetectionLimit mdl = MethodDetectionLimit.fromZeroReadings("HCl",
                new double[] { 0.1, -0.1, 0.2, -0.2, 0, 0.3, -0.3 }, new double[7]);
        ReportContent plain = CampaignFixture.unsigned().averagingRule("a rule").build();
        ReportContent withMdl = CampaignFixture.unsigned().averagingRule("a rule").detectionLimit(mdl).build();
        assertNotEquals(plain.contentHash(), withMdl.contentHash(), "the MDL table is part of what is signed");
        ReportContent signed = withMdl.withSignature(CampaignFixture.signature("B. Second", Instant.EPOCH,
                SignatureMeaning.REVIEWED, withMdl.contentHash()));
        assertEquals(withMdl.contentHash(), signed.contentHash(), "signing changes no content");
        assertEquals(List.of(mdl), signed.detectionLimits());
        assertEquals(withMdl.averagingRules(), signed.averagingRules());
    }

    @Test
    void campaignDatesMustBeOrdered() {
        Campaign c = CampaignFixture.campaign();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Campaign(c.reportId(),
                c.client(), c.plant(), c.source(), c.lastDay(), c.firstDay(), c.issued(), c.reportingBasis()));
        assertTrue(e.getMessage().contains("lastDay"), e.getMessage());
    }

    @Test
    void onlyReviewAndApprovalSignaturesArePrinted() {
        // 21 CFR 11.50(a)(3) names review, approval, responsibility and authorship; the report's review block
        // prints review and approval only
        ReportContent c = CampaignFixture.unsigned().build();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> c.withSignature(
                CampaignFixture.signature("B. Second", Instant.EPOCH, SignatureMeaning.AUTHORED, c.contentHash())));
        assertTrue(e.getMessage().startsWith("meaning:") && e.getMessage().endsWith("AUTHORED"), e.getMessage());
        assertEquals(List.of(SignatureMeaning.REVIEWED, SignatureMeaning.APPROVED), SignatureWords.PRINTED);
    }
}
