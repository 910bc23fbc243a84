// A field polynomial that is not monic.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found 2*x^2 - x - 1; the field polynomial is not monic')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
