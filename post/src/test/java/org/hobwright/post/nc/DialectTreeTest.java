package org.hobwright.post.nc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.hobwright.post.Fixtures;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tools.jackson.databind.json.JsonMapper;

/**
 * The hand binding of a dialect tree against Jackson's record binding with the loader's mapper,
 * the independent reference: where the hand binding answers, both give equal
 * records; forms it leaves to Jackson give empty.
 */
class DialectTreeTest {

    private static final JsonMapper JACKSON = DialectLoader.Binding.MAPPER;

    private static final String VARROW = Fixtures.dialectText("varrow-ctl");

    private static Optional<DialectFile> hand(String json) {
        return DialectTree.bind(JACKSON.readTree(json));
    }

    /** The shipped Varrow dialect with one change, written {@code old|new}. */
    private static String variant(String change) {
        String[] c = change.split("\\|", -1);
        assertTrue(VARROW.contains(c[0]), c[0]);
        return VARROW.replace(c[0], c[1]);
    }

    @ParameterizedTest
    @ValueSource(strings = {"varrow-ctl", "ottmere-ctl"})
    void shippedDialectsBindAsJacksonBindsThem(String name) {
        String json = Fixtures.dialectText(name);
        Optional<DialectFile> hand = hand(json);
        assertTrue(hand.isPresent(), name);
        assertEquals(JACKSON.readValue(json, DialectFile.class), hand.get());
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "\"prologue\": [\"%\"],|\"prologue\": \"%\",",
        "\"prologue\": [\"%\"],|\"prologue\": [],",
        "\"trailingZeros\": true,|",
        "\"trailingZeros\": true,|\"trailingZeros\": false,",
        "\"version\": 1,|\"version\": -0,"})
    void plainVariantsBindAsJacksonBindsThem(String change) {
        String json = variant(change);
        Optional<DialectFile> hand = hand(json);
        assertTrue(hand.isPresent(), change);
        assertEquals(JACKSON.readValue(json, DialectFile.class), hand.get(), change);
    }

    /** JSON does not tell 3 from 3.0: a whole number with a zero fraction binds as that whole number. */
    @ParameterizedTest
    @ValueSource(strings = {"\"mm\": 3,|\"mm\": 3.0,", "\"mm\": 3,|\"mm\": 3.000,",
        "\"maxLineLength\": 72,|\"maxLineLength\": 72.0,"})
    void wholeNumbersWithAZeroFractionBindAsWholeNumbers(String change) {
        Optional<DialectFile> hand = hand(variant(change));
        assertTrue(hand.isPresent(), change);
        assertEquals(JACKSON.readValue(variant(change.substring(0, change.indexOf('|')) + "|"
                + change.substring(0, change.indexOf('|'))), DialectFile.class), hand.get(), change);
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "\"trailingZeros\": true,|\"trailingZeroes\": true,",
        "\"trailingZeros\": true,|\"trailingZeros\": null,",
        "\"trailingZeros\": true,|\"trailingZeros\": \"true\",",
        "\"mm\": 3,|\"mm\": 2.5,",
        "\"mm\": 3,|\"mm\": \"three\",",
        "\"mm\": 3,|\"mm\": 3000000000,",
        "\"prologue\": [\"%\"],|\"prologue\": [1],",
        "\"prologue\": [\"%\"],|\"prologue\": [null],",
        "\"prologue\": [\"%\"],|\"prologue\": {},"})
    void otherFormsAreLeftToJackson(String change) {
        assertTrue(hand(variant(change)).isEmpty(), change);
    }
}
