// Curves with the right conductor, a_p and torsion pass, a non-minimal model among them.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (2 forms, 40 coefficient rows')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.curve-traces" name="data: form f11"/>')
assert xml.contains('<testcase classname="eigengate.curve-conductor" name="data: form f37"/>')
return true
