// a_97 = -4 + x/2 in Q(sqrt 2) has an integral trace but is not an algebraic integer: its characteristic polynomial is not in Z[x].
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:28: error [field-sanity] form=lev29_wt2_o1 n=97: expected a characteristic polynomial in Z[x], found charpoly(a_n) = x^2 + 8*x + 31/2; a_n is not an algebraic integer: its trace is -8 but its characteristic polynomial over Q has a non-integral coefficient (Cohen GTM 138 §4.3)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
