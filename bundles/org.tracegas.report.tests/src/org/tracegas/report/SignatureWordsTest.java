package org.tracegas.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tracegas.audit.SignatureMeaning;

class SignatureWordsTest {

    @Test
    void reviewAndApprovalAreWordedAsTheReportPrintsThem() {
        // 21 CFR 11.50(a)(3): the meaning "such as review, approval" is shown with the signature
        assertEquals("Review", SignatureWords.noun(SignatureMeaning.REVIEWED));
        assertEquals("Reviewed", SignatureWords.pastTense(SignatureMeaning.REVIEWED));
        assertEquals("Approval", SignatureWords.noun(SignatureMeaning.APPROVED));
        assertEquals("Approved", SignatureWords.pastTense(SignatureMeaning.APPROVED));
        assertTrue(SignatureWords.explanation(SignatureMeaning.APPROVED).startsWith("Approval: "));
    }

    @Test
    void authorshipAndResponsibilityAreNotWordedForTheReviewBlock() {
        for (SignatureMeaning m : new SignatureMeaning[] {SignatureMeaning.AUTHORED, SignatureMeaning.RESPONSIBLE}) {
            assertFalse(SignatureWords.printed(m));
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SignatureWords.noun(m));
            assertTrue(e.getMessage().startsWith("meaning:") && e.getMessage().contains(m.name()), e.getMessage());
        }
    }
}
