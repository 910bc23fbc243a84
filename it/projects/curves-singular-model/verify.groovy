// A singular cubic (discriminant 0) in curves.csv is a table-format error naming file, line and column.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/curves.csv:3:2: error [table-format] form=f11: expected a model with nonzero discriminant, found discriminant 0; the cubic [0,0,0,-3,2] is singular (a node or a cusp), not an elliptic curve')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
