package io.github.eigengate.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.github.eigengate.check.Check;
import io.github.eigengate.check.FindingSink;
import io.github.eigengate.check.FormCheck;
import io.github.eigengate.data.Catalog;
import io.github.eigengate.data.FormData;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A check that throws is a defect of Eigengate: the run still returns a report, and the defect is an error of that
 * check for that unit, never a pass. Data: the level-11 newform, a_1..a_3 = 1, -2, -1 (OEIS A006571).
 */
class InternalErrorTest {

    @TempDir
    Path dir;

    static final class Throwing implements FormCheck {
        @Override
        public String id() {
            return "throwing";
        }

        @Override
        public String title() {
            return "throws on every form";
        }

        @Override
        public <E> void check(FormData<E> form, Catalog catalog, FindingSink out) {
            throw new IllegalStateException("planted defect");
        }
    }

    static final class ThrowingAtTheEnd implements Check {
        @Override
        public String id() {
            return "throwing-at-the-end";
        }

        @Override
        public String title() {
            return "throws when it judges";
        }

        @Override
        public Pass start(Catalog catalog) {
            return new Pass() {
                @Override
                public void form(FormData<?> form, FindingSink out) {
                }

                @Override
                public void finish(FindingSink out) {
                    throw new ArithmeticException("planted");
                }
            };
        }
    }

    @Test
    void aThrowingCheckIsAnErrorForItsUnit() {
        Datasets.write(dir, "forms.csv", "id,level,weight\nf11,11,2\n", "coefficients.csv",
                "form,n,value\nf11,1,1\nf11,2,-2\nf11,3,-1\n");
        for (int threads : new int[] {1, 2}) {
            Report r = new Gate(Settings.defaults().withThreads(threads), List.of(new Throwing(),
                    new ThrowingAtTheEnd())).run(List.of(new Gate.Dataset(dir, "data")));
            assertEquals(List.of("data: error [throwing-at-the-end] dataset=data: expected a verdict, found "
                            + "ArithmeticException; internal error of the check (java.lang.ArithmeticException: "
                            + "planted): nothing is decided for this unit; please report it",
                    "data/forms.csv:2: error [throwing] form=f11: expected a verdict, found IllegalStateException; "
                            + "internal error of the check (java.lang.IllegalStateException: planted defect): nothing "
                            + "is decided for this unit; please report it"), Datasets.lines(r));
            assertTrue(r.failed());
        }
    }
}
