// coefficients.csv without the value column.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:1: error [table-format] table=data/coefficients.csv: expected a column \'value\', found columns form,n; the column \'value\' is required in data/coefficients.csv')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
