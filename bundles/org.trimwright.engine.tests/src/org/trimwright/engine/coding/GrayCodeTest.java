package org.trimwright.engine.coding;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class GrayCodeTest {

    // OEIS A003188 "Decimal equivalent of Gray code for n", first 32 terms (oeis.org/A003188).
    private static final int[] A003188 = {0, 1, 3, 2, 6, 7, 5, 4, 12, 13, 15, 14, 10, 11, 9, 8, 24, 25, 27, 26, 30,
        31, 29, 28, 20, 21, 23, 22, 18, 19, 17, 16};

    // OEIS A006068 "a(n) is Gray-coded into n" (the inverse permutation), first 32 terms (oeis.org/A006068).
    private static final int[] A006068 = {0, 1, 3, 2, 7, 6, 4, 5, 15, 14, 12, 13, 8, 9, 11, 10, 31, 30, 28, 29, 24,
        25, 27, 26, 16, 17, 19, 18, 23, 22, 20, 21};

    @Test
    void grayCodeMatchesOeisA003188() {
        for (int n = 0; n < 32; n++) {
            assertEquals(A003188[n], GrayCode.toGray(n), "n=" + n);
        }
    }

    @Test
    void inverseGrayCodeMatchesOeisA006068() {
        for (int n = 0; n < 32; n++) {
            assertEquals(A006068[n], GrayCode.fromGray(n), "n=" + n);
        }
    }

    @Test
    void grayFieldDecodesRegisterThroughTheInverse() {
        CodeMap map = new CodeMap(FieldCoding.of(5, CodingScheme.GRAY, 0));
        for (int code = 0; code < 32; code++) {
            // the register holds gray(level): level = A006068(code)
            assertEquals(A006068[code], map.level(code));
        }
    }
}
