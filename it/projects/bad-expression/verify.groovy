// An unparsable polynomial expression.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:18:3: error [table-format] form=lev23_wt2_o1 n=3: expected a polynomial in x with rational coefficients or a vector [c0, ..., c1], found 2*x^^2; the expression cannot be read at character')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
