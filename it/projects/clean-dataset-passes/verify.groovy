// True coefficients pass; reports are written.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (2 forms, 24 coefficient rows')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
def json = new File(basedir, "target/eigengate/report.json").getText("UTF-8")
assert json.contains('"passed": true')
def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.normalisation" name="data: form lev11_wt2_o1"/>')
return true
