// A configured dataset directory that does not exist.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] tables: error [table-format] dataset=tables: expected a dataset directory, found nothing; the dataset directory does not exist')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
