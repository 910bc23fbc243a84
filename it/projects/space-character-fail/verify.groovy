// spaces.csv rows with characters: a Galois orbit with no forms, a malformed character, a weight of the wrong parity, weight 1.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/spaces.csv:5:3: error [table-format] space=line 5: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/5; the character cannot be read: χ(2) = exp(2πi·1/5) has order 5, which does not divide the order 12 of 2 mod 13')
expect('[ERROR] data/spaces.csv:6:2: error [table-format] space=line 6: expected an odd weight (χ(−1) = -1 = (−1)^k), found 2; S_k(N, χ) = 0 unless χ(−1) = (−1)^k, since −I ∈ Γ0(N) acts on it by χ(−1)(−1)^k')
expect('[ERROR] data/spaces.csv:4: error [space-dimension] space=N=13 k=2 χ=2:1/6: expected [Q(χ):Q]·dim S_k^new(N, χ) = 2·1 = 2, found sum of field degrees = 0 (no forms); the declared forms do not fill the new subspace: an orbit is missing (or a field is too small)')
expect('[INFO] data/spaces.csv:7: note [space-dimension] space=N=23 k=1 χ=5:1/2: completeness of weight 1 not checkable: no formula gives dim S_1(N, χ), so the listing is neither passed nor failed')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
assert log.contains("[ERROR] eigengate: 3 errors,") : "the complete trivial space passes"
return true
