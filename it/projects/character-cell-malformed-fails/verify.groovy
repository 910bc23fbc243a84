// Each malformed character or zeta cell is a table-format error with file, line, column and what was expected.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/forms.csv:2:4: error [table-format] form=notgen: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 4:1/6; the generators do not generate (Z/13Z)^×: they reach 6 of its 12 elements')
expect('[ERROR] data/forms.csv:3:4: error [table-format] form=inconsistent: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/6;4:1/6; the values are not those of a character')
expect('[ERROR] data/forms.csv:4:4: error [table-format] form=order: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/5; χ(2) = exp(2πi·1/5) has order 5, which does not divide the order 12 of 2 mod 13')
expect('[ERROR] data/forms.csv:5:6: error [table-format] form=nozeta: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found an empty cell; the cell is empty')
expect('[ERROR] data/forms.csv:6:6: error [table-format] form=smallzeta: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found x - 1; Φ_6(zeta) = -2*x + 2 ≠ 0')
expect('[ERROR] data/forms.csv:7:3: error [table-format] form=parity: expected an odd weight, found 2; S_k(N, χ) = 0: χ(−1) = −1 but (−1)^k = 1')
expect('[ERROR] data/forms.csv:8:4: error [table-format] form=nonunit: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 3:1/2;2:1/6; 3 is not a unit g with 1 < g < 21')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
