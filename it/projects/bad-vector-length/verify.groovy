// A power-basis vector with three entries in a quadratic field.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:19:3: error [table-format] form=lev23_wt2_o1 n=4: expected a polynomial in x with rational coefficients or a vector [c0, ..., c1], found [-1, 1, 0]; the vector has 3 entries but the field has degree 2')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
