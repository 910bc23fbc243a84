// A field polynomial with a non-integral coefficient.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found x^2 - 1/2*x - 1; the field polynomial has non-integral coefficients')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
