package io.github.eigengate.data;

/** A row of {@code spaces.csv}: the claim that the dataset lists every newform orbit of this space. */
public record SpaceRow(SpaceKey space, SourceLocation location) {
}
