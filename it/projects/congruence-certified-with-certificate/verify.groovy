// tau(l) = a_l(f11) mod 11 (a classical congruence, from memory; checked in PARI/GP) is certified from l <= 12 and a certificate is written.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[INFO] data/congruences.csv:3: note [congruence] congruence=delta~f11 p=11: certified: a_l(delta) = l^0*a_l(f11) mod a prime above 11 for every prime l not dividing 11, having checked every l <= B = 12')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
def cert = new File(basedir, "target/eigengate/certificates/congruence-delta-f11-p11.txt").getText("UTF-8")
assert cert.contains("bound B = floor(W*index/12): 12") : cert
assert cert.contains("sha256 ") && cert.contains("  coefficients.csv") : cert
assert cert.contains("  congruences.csv") : "the claim file is hashed too: " + cert
return true
