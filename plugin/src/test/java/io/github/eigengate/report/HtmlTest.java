package io.github.eigengate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;

/** The element builder escapes every text and attribute value, so no data-derived string becomes markup. */
class HtmlTest {

    private static final String HOSTILE = "</td><script>alert('x')</script><img src=x onerror=\"y\">&amp;";

    @Test
    void textIsEscapedWhole() {
        assertEquals("<p class=\"c\">&lt;/td&gt;&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt;&lt;img src=x "
                        + "onerror=&quot;y&quot;&gt;&amp;amp;</p>",
                Html.el("p", "c", HOSTILE).toString());
    }

    @Test
    void attributeValuesCannotEscapeTheirQuotes() {
        Html h = Html.el("div").attr("data-form", HOSTILE).text("t");
        Document d = Jsoup.parseBodyFragment(h.toString());
        assertEquals(1, d.body().children().size());
        assertEquals(HOSTILE, d.body().child(0).attr("data-form"));
        assertEquals(0, d.select("script, img").size());
    }

    @Test
    void aParsedTextReadsBackAsTheOriginal() {
        Document d = Jsoup.parseBodyFragment(Html.el("td").text(HOSTILE).toString());
        assertEquals(HOSTILE, d.body().text());
    }

    @Test
    void controlCharactersAreReplaced() {
        assertEquals("a\uFFFDb", Html.escape("a\u0001b"));
    }

    @Test
    void elementAndAttributeNamesAreConstantsOnly() {
        assertThrows(IllegalArgumentException.class, () -> Html.el("p onclick=x"));
        assertThrows(IllegalArgumentException.class, () -> Html.el("p").attr("x\"y", "v"));
    }

    @Test
    void anchorsKeepDistinctInputsDistinct() {
        assertEquals("data--lev11_5f_wt2", Html.anchor("data", "lev11_wt2"));
        assertNotEquals(Html.anchor("a-b", "c"), Html.anchor("a", "b-c"));
        assertNotEquals(Html.anchor("a_b"), Html.anchor("a-b"));
    }

    @Test
    void numbersUseADotAndTwoDecimals() {
        assertEquals("3.14", Html.num(Math.PI));
        assertEquals("0.00", Html.num(-0.001));
        assertEquals("0", Html.num(Double.NaN));
    }
}
