// A non-integer a_n for a form with rational coefficients.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:9:3: error [table-format] form=lev11_wt2_o1 n=6: expected an integer, found 1/2; the form has rational coefficients (no field), so a_n must be an integer')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
