// In a complete space given by a_p only, a_7 replaced by its Galois conjugate (same trace and norm) fails Σ Tr(a_p a_q) = Tr T_pq, and the finding names a_7 and the automorphism.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:7: error [space-trace-products] form=lev29_wt2_o1 n=7: expected 2*x, found -2*x; likely culprit: Σ_f Tr(a_p a_q) = Tr T_pq fails in space N=29 k=2 at pq = 2*7, 3*7, 7*11, 7*13, 7*17 and 14 more, all involving a_7; a_7 = 2*x in this form makes every identity at 7 hold (and Σ_f Tr(a_7^2) too); the value found is σ(2*x) for the automorphism σ: x ↦ -x of K')
expect('[ERROR] data/spaces.csv:3: error [space-trace-products] space=N=29 k=2 pq=2*7: expected Tr T_14 = 8, found Σ Tr(a_2 a_7) = -8;')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
