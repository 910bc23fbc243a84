// An empty forms.csv.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv: error [table-format] table=data/forms.csv: expected a header row, found an empty file; every table starts with a header row naming its columns')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
