// An a_p replaced by its complex conjugate breaks conj(a_p) = chi-bar(p)a_p, which ramanujan-bound decides exactly.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:6: error [ramanujan-bound] form=lev13_wt2_chi6_o1 n=3: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 12], found a_p = -2*x, χ(p) = -x, χ̄(p)*a_p^2 with characteristic polynomial x^2 + 4*x + 16; χ̄(p)*a_p^2 is not real and >= 0 in every embedding, so conj(a_p) = χ̄(p)*a_p fails at p=3 (is a_p replaced by its complex conjugate, or χ(p) wrong?)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
