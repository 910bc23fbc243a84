// A Ramanujan-Petersson violation that shows in one pair of complex embeddings of a CM quartic field only.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:65: error [ramanujan-bound] form=lev13_wt3_chi4_o1 n=2: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 16], found a_p = 2/21*x^3 + 5/21*x^2 - 5/7*x + 17/21, χ(p) = ')
expect('; Deligne\'s bound |a_p| <= 2 p^((k-1)/2) fails in some complex embedding at p=2')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
