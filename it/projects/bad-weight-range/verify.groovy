// Weight 0 is out of range.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv:4:3: error [table-format] form=lev23_wt2_o1: expected an integer in [1, 10000], found 0; \'weight\' is out of range')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
