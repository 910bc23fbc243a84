package io.github.eigengate.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The character cell's grammar; the values are those of the contract's own examples (docs/data-contract.md). */
class CharacterCellTest {

    @Test
    void contractExamplesParse() {
        assertTrue(CharacterCell.parse("", 13).character().isTrivial());
        assertTrue(CharacterCell.parse("1", 13).character().isTrivial());
        assertEquals(6, CharacterCell.parse("2:1/6", 13).character().order());
        var quadratic = CharacterCell.parse("11:1/2;17:0/1", 20).character();
        assertEquals(2, quadratic.order());
        assertEquals(quadratic, CharacterCell.parse(" 11 : 2/4 ; 17:0/1 ", 20).character());
    }

    @Test
    void malformedCellsSayWhy() {
        assertEquals("pair 1 'x' is not of the form g:a/b", CharacterCell.parse("x", 13).problem());
        assertEquals("pair 1 has denominator 0; it must be positive", CharacterCell.parse("2:1/0", 13).problem());
        assertFalse(CharacterCell.parse("4:1/6", 13).ok());
        assertEquals("13 is not a unit g with 1 < g < 13", CharacterCell.parse("13:1/2", 13).problem());
    }
}
