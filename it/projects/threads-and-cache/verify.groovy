// Two threads and a cache directory of its own: the planted error is reported as with one thread, and the cache is written.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
assert new File(basedir, "target/gate-cache").listFiles().length > 0 : "the cache was not written"
return true
