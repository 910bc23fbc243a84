package io.github.eigengate.data;

/**
 * A place in a dataset: a file as it should be shown to the user, a 1-based line and a 1-based column
 * (the CSV field's position in its row; 0 when the place is a whole row or a whole file).
 */
public record SourceLocation(String file, int line, int column) {

    public static SourceLocation file(String file) {
        return new SourceLocation(file, 0, 0);
    }

    public static SourceLocation row(String file, int line) {
        return new SourceLocation(file, line, 0);
    }

    public SourceLocation column(int column) {
        return new SourceLocation(file, line, column);
    }

    /** {@code file}, {@code file:line} or {@code file:line:column}, the prefix of every report line. */
    @Override
    public String toString() {
        if (line <= 0) {
            return file;
        }
        return column <= 0 ? file + ":" + line : file + ":" + line + ":" + column;
    }
}
