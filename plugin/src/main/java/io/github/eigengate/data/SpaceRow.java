package io.github.eigengate.data;

/**
 * A row of {@code spaces.csv}: the claim that the dataset lists every newform orbit of S_k^new(N, χ') for every χ' in
 * the Galois orbit of the space's character.
 */
public record SpaceRow(SpaceKey space, SourceLocation location) {
}
