// Level 0 is out of range.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv:3:2: error [table-format] form=lev11_wt2_o1: expected an integer in [1, 2147483647], found 0; \'level\' is out of range')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
