// Every malformed row of a run is reported, not only the first.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] eigengate: 3 errors')
expect('data/coefficients.csv:5:3: error [table-format] form=lev11_wt2_o1 n=2')
expect('data/coefficients.csv:8:3: error [table-format] form=lev11_wt2_o1 n=5')
expect('data/coefficients.csv:15:3: error [table-format] form=lev11_wt2_o1 n=12')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
