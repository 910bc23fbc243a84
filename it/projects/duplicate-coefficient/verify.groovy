// a_5 given twice with different values.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:28:3: error [table-format] form=lev11_wt2_o1 n=5: expected 1, found -1; a_5 is given twice with different values (first at data/coefficients.csv:8)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
