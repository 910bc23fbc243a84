// One orbit listed twice under two ids is named as a duplicated orbit.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv:4: error [duplicate-orbit] form=again: expected a newform differing from lev37_wt2_o1, found the same 26 coefficients as lev37_wt2_o1 (data/forms.csv:3); a duplicated orbit: distinct newforms of one space differ at some a_p (multiplicity one), so again repeats lev37_wt2_o1')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
