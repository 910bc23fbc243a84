// A coefficients file that is not UTF-8.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:3: error [table-format] table=data/coefficients.csv: expected UTF-8 text, found bytes that are not UTF-8; line 3 is not valid UTF-8; it is not read')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
