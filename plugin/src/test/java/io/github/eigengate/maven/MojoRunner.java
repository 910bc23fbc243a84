package io.github.eigengate.maven;

import java.io.File;
import java.lang.reflect.Field;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.logging.Log;

/** Runs a goal as Maven would after injecting its parameters, and keeps what it logged, as Maven prints it. */
public final class MojoRunner {

    private MojoRunner() {
    }

    /** The default parameters of the check goal for a project in {@code basedir} and the given datasets. */
    public static CheckMojo check(Path basedir, List<Path> datasets) {
        CheckMojo m = new CheckMojo();
        set(m, "datasets", datasets.stream().map(Path::toFile).toList());
        set(m, "skip", false);
        set(m, "maxFindings", 1000);
        set(m, "uncertified", "error");
        set(m, "outputDirectory", basedir.resolve("target/eigengate").toFile());
        set(m, "basedir", basedir.toFile());
        set(m, "failOnError", true);
        set(m, "failOnWarning", false);
        // the defaults the plugin descriptor would inject (CheckMojo's @Parameter defaultValue)
        set(m, "cache", false);
        set(m, "workBudget", 10_000_000_000L);
        set(m, "overBudget", "error");
        set(m, "root", basedir.toFile());
        return m;
    }

    public static void set(Object mojo, String field, Object value) {
        try {
            Field f = mojo.getClass().getDeclaredField(field);
            f.setAccessible(true);
            f.set(mojo, value);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Lines as Maven's console shows them: {@code [ERROR] …}, {@code [WARNING] …}, {@code [INFO] …}. */
    public static List<String> capture(AbstractMojo mojo) {
        List<String> lines = new ArrayList<>();
        mojo.setLog(new Log() {
            public boolean isDebugEnabled() { return false; }
            public void debug(CharSequence c) { }
            public void debug(CharSequence c, Throwable t) { }
            public void debug(Throwable t) { }
            public boolean isInfoEnabled() { return true; }
            public void info(CharSequence c) { lines.add("[INFO] " + c); }
            public void info(CharSequence c, Throwable t) { lines.add("[INFO] " + c); }
            public void info(Throwable t) { lines.add("[INFO] " + t); }
            public boolean isWarnEnabled() { return true; }
            public void warn(CharSequence c) { lines.add("[WARNING] " + c); }
            public void warn(CharSequence c, Throwable t) { lines.add("[WARNING] " + c); }
            public void warn(Throwable t) { lines.add("[WARNING] " + t); }
            public boolean isErrorEnabled() { return true; }
            public void error(CharSequence c) { lines.add("[ERROR] " + c); }
            public void error(CharSequence c, Throwable t) { lines.add("[ERROR] " + c); }
            public void error(Throwable t) { lines.add("[ERROR] " + t); }
        });
        return lines;
    }

    static File file(Path p) {
        return p.toFile();
    }
}
