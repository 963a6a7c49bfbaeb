package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;

import org.junit.jupiter.api.Test;

class ReportContentTest {

    @Test
    void hashIgnoresSignaturesButNotContent() {
        ReportContent unsigned = CampaignFixture.unsigned().build();
        ReportContent reviewed = CampaignFixture.reviewed();
        assertEquals(unsigned.contentHash(), reviewed.contentHash());
        assertEquals(64, unsigned.contentHash().length());
        assertNotEquals(unsigned.contentHash(), CampaignFixture.unsigned().caution("extra").build().contentHash());
        assertTrue(reviewed.signature(SignatureMeaning.REVIEW).isPresent());
        assertTrue(reviewed.signature(SignatureMeaning.APPROVAL).isEmpty());
    }

    @Test
    void secondReviewIsRejected() {
        ReportContent reviewed = CampaignFixture.reviewed();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> reviewed.withSignature(
                new Signature("B. Second", Instant.EPOCH, SignatureMeaning.REVIEW, reviewed.contentHash())));
        assertTrue(e.getMessage().contains("more than one review"), e.getMessage());
    }

    @Test
    void campaignDatesMustBeOrdered() {
        Campaign c = CampaignFixture.campaign();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Campaign(c.reportId(),
                c.client(), c.plant(), c.source(), c.lastDay(), c.firstDay(), c.issued(), c.reportingBasis()));
        assertTrue(e.getMessage().contains("lastDay"), e.getMessage());
    }
}
