package io.github.eigengate.check;

/**
 * A citable record that a claim was proved from the data, written as {@code name} under
 * {@code target/eigengate/certificates/}.
 *
 * @param name a file name, unique within a run
 * @param text the record, plain UTF-8 text
 */
public record Certificate(String name, String text) {
}
