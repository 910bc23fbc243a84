// A predicted weight set that drops a Serre weight fails, naming form, p and the missing weight (level 11 is supersingular at 19: a_19 = 0).
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/modp-weights.csv:2:4: error [weight-set] form=f11 p=19: expected (0,0);(18,0), found (0,0); missing (18,0);')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
