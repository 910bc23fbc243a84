// a_2 = 2 instead of -2 breaks a_6 and a_10 (a_4 = a_2^2 - 2, a_8 and a_12 do not see the sign); one finding names a_2 with the value that satisfies them all, then the two follow.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:5: error [hecke-relations] form=lev11_wt2_o1 n=2: expected -2, found 2; likely culprit: 2 relations fail, all involve a_2 (n = 6, 10); a_2 = -2 satisfies every relation it enters')
expect('[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected -2, found 2; a_mn = a_m a_n for coprime m=2, n=3, a_2=2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)')
expect('[ERROR] data/coefficients.csv:13: error [hecke-relations] form=lev11_wt2_o1 n=10: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=5, a_2=2, a_5=1 (Diamond–Shurman Prop. 5.8.5)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
