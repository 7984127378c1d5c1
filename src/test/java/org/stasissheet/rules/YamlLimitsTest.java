package org.stasissheet.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Rule files are refused early when hostile: too large, not UTF-8, nested too deep, or with an overlong key or
 * value. Each limit is checked on both sides of its edge, and each refusal says where and what.
 */
class YamlLimitsTest {

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    @Test
    @DisplayName("a file of exactly the size limit is read; one byte more is refused before parsing")
    void sizeLimit() throws YamlTree.Malformed {
        byte[] atLimit = new byte[YamlTree.MAX_BYTES];
        Arrays.fill(atLimit, (byte) ' ');
        byte[] key = utf8("a: 1\n");
        System.arraycopy(key, 0, atLimit, 0, key.length);
        assertInstanceOf(YamlTree.Mapping.class, YamlTree.parse(atLimit));

        byte[] over = Arrays.copyOf(atLimit, YamlTree.MAX_BYTES + 1);
        over[over.length - 1] = ' ';
        YamlTree.Malformed e = assertThrows(YamlTree.Malformed.class, () -> YamlTree.parse(over));
        assertTrue(e.getMessage().contains(Integer.toString(YamlTree.MAX_BYTES + 1)), e.getMessage());
        assertEquals(new YamlTree.Where(1, 1), e.where);
    }

    @Test
    @DisplayName("a byte that is not UTF-8 is named with its offset, line and column")
    void invalidUtf8_isLocated() {
        byte[] text = utf8("a: 1\nbb: x\n");
        // line 2 is "bb: x": replace the x (offset 9, column 5) with 0xFF, which never occurs in UTF-8 (RFC 3629)
        text[9] = (byte) 0xFF;
        YamlTree.Malformed e = assertThrows(YamlTree.Malformed.class, () -> YamlTree.parse(text));
        assertEquals(new YamlTree.Where(2, 5), e.where);
        assertTrue(e.getMessage().contains("0xFF"), e.getMessage());
        assertTrue(e.getMessage().contains("byte offset 9"), e.getMessage());
        assertTrue(!e.getMessage().contains("Exception"), e.getMessage());
    }

    @Test
    @DisplayName("nesting up to the limit is read; one level more is refused where it starts")
    void depthLimit() throws YamlTree.Malformed {
        assertInstanceOf(YamlTree.Mapping.class, YamlTree.parse(utf8("a: " + nest(YamlTree.MAX_DEPTH - 1))));
        YamlTree.Malformed e = assertThrows(YamlTree.Malformed.class,
                () -> YamlTree.parse(utf8("a: " + nest(YamlTree.MAX_DEPTH))));
        assertTrue(e.getMessage().contains("nested more than " + YamlTree.MAX_DEPTH), e.getMessage());
        // the mapping is level 1, the flow lists start at column 4 on line 1: the refused one is the last opened
        assertEquals(1, e.where.line());
        assertEquals(4 + YamlTree.MAX_DEPTH - 1, e.where.column());
    }

    private static String nest(int lists) {
        return "[".repeat(lists) + "1" + "]".repeat(lists) + "\n";
    }

    @Test
    @DisplayName("a value or key of the length limit is read; one character more is refused")
    void scalarLimit() throws YamlTree.Malformed {
        String atLimit = "x".repeat(YamlTree.MAX_SCALAR_CHARS);
        // a key longer than 1024 characters must be written as an explicit key ("? key" then ": value"): YAML 1.1
        YamlTree.Mapping m = (YamlTree.Mapping) YamlTree.parse(utf8("a: " + atLimit + "\n? " + atLimit + "\n: 1\n"));
        assertTrue(m.entries().containsKey(atLimit));
        assertEquals(atLimit, ((YamlTree.Scalar) m.entries().get("a")).text());
        YamlTree.Malformed value = assertThrows(YamlTree.Malformed.class,
                () -> YamlTree.parse(utf8("a: " + atLimit + "y\n")));
        assertTrue(value.getMessage().contains("value of " + (YamlTree.MAX_SCALAR_CHARS + 1)), value.getMessage());
        assertEquals(new YamlTree.Where(1, 4), value.where);
        YamlTree.Malformed key = assertThrows(YamlTree.Malformed.class,
                () -> YamlTree.parse(utf8("b: 1\n? " + atLimit + "y\n: 1\n")));
        assertTrue(key.getMessage().contains("key of " + (YamlTree.MAX_SCALAR_CHARS + 1)), key.getMessage());
        assertEquals(2, key.where.line());
    }

    @Test
    @DisplayName("the parser's own event class names become words")
    void parserEvents_becomeWords() {
        String raw = "Expected a field name (Scalar value in YAML), got this instead: "
                + "<org.yaml.snakeyaml.events.MappingStartEvent(anchor=null, tag=null, implicit=true)>";
        assertEquals("Expected a field name (Scalar value in YAML), got this instead: the start of a mapping",
                YamlTree.plainWords(raw));
        assertEquals("got a value", YamlTree.plainWords("got <org.yaml.snakeyaml.events.ScalarEvent(x)>"));
        assertEquals("no event here", YamlTree.plainWords("no event here"));
    }

    @Test
    @DisplayName("a message quotes a long value by its start and length, not whole")
    void longQuotedValues_areAbbreviated() {
        String value = "9".repeat(5_000);
        String message = RuleSetLoader.abbreviated("unit \"" + value + "\" is not a unit of uric acid");
        assertEquals("unit \"" + "9".repeat(40) + "… (5000 characters)\" is not a unit of uric acid", message);
        assertEquals("was " + "x".repeat(40) + "… (61 characters)", RuleSetLoader.abbreviated("was " + "x".repeat(61)));
        String sixty = "unit \"" + "y".repeat(60) + "\" is unknown";
        assertEquals(sixty, RuleSetLoader.abbreviated(sixty));
    }
}
