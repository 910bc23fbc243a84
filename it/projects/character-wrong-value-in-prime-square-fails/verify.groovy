// A coefficient a_{p^2} computed with the wrong chi(p) fails the Hecke recursion with the character.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:7: error [hecke-relations] form=lev13_wt2_chi6_o1 n=4: expected x, found 5*x - 2; ')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
