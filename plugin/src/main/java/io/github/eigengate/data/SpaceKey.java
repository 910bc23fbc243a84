package io.github.eigengate.data;

/** A space S_k(Γ0(N)) with trivial character, written {@code N=11 k=2} in reports. */
public record SpaceKey(int level, int weight) {
    @Override
    public String toString() {
        return "N=" + level + " k=" + weight;
    }
}
