// A composite coefficient that breaks a_mn = a_m a_n is named with both sides.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
