#!/usr/bin/env python3
# Regenerates it/projects/*: one small project per behaviour, each with a verify.groovy asserting exact log lines.
# Run: python3 it/tools/generate-projects.py (then review the diff). Values: see the comments on L11 and L23 below.
import os, textwrap
import pathlib
root=str(pathlib.Path(__file__).resolve().parent.parent / 'projects')
POM='''<?xml version="1.0" encoding="UTF-8"?>
<project xmlns="http://maven.apache.org/POM/4.0.0"
         xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
         xsi:schemaLocation="http://maven.apache.org/POM/4.0.0 https://maven.apache.org/xsd/maven-4.0.0.xsd">
  <modelVersion>4.0.0</modelVersion>
  <groupId>io.github.eigengate.it</groupId>
  <artifactId>%(name)s</artifactId>
  <version>1.0</version>
  <packaging>pom</packaging>
  <description>%(desc)s</description>
  <build>
    <plugins>
      <plugin>
        <groupId>@project.groupId@</groupId>
        <artifactId>eigengate-maven-plugin</artifactId>
        <version>@project.version@</version>
        <executions>
          <execution>
            <phase>verify</phase>
            <goals><goal>check</goal></goals>
          </execution>
        </executions>%(config)s
      </plugin>
    </plugins>
  </build>%(reporting)s
</project>
'''
# a_n of the weight-2 newform of level 11, n = 1..12: OEIS A006571; also computed with PARI/GP 2.15.2 (Debian pari-gp):
# mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 12)
L11 = [1, -2, -1, 2, 1, 2, -2, 0, -2, -2, 1, -2]
# level 23, weight 2, field y^2 - y - 1 (here x^2 - x - 1), PARI/GP 2.15.2:
# apply(lift, mfcoefs(mfeigenbasis(mfinit([23,2],0))[1], 12))
L23 = ['1', '-x', '2*x - 1', 'x - 1', '-2*x', '-x - 2', '-2*x + 2', '2*x - 1', '2', '2*x + 2', '2*x - 4', '-x + 3']
SRC = ('# a_n: level 11 from OEIS A006571; level 23 computed with PARI/GP 2.15.2 (Debian package pari-gp):\n'
       '#   apply(lift, mfcoefs(mfeigenbasis(mfinit([23,2],0))[1], 12))   (field y^2 - y - 1, written in x)\n')
FORMS = '# two newforms: S_2(Gamma0(11)) and one orbit of S_2(Gamma0(23))\nid,level,weight,character,field\nlev11_wt2_o1,11,2,,\nlev23_wt2_o1,23,2,,x^2 - x - 1\n'
def coeffs(l11=L11, l23=L23, extra=''):
    s = SRC + 'form,n,value\n'
    for i,v in enumerate(l11): s += 'lev11_wt2_o1,%d,%s\n' % (i+1, v)
    for i,v in enumerate(l23): s += 'lev23_wt2_o1,%d,%s\n' % (i+1, ('"%s"' % v) if ',' in v else v)
    return s + extra
def project(name, desc, files, expect, fail=True, config='', extra_verify='', reporting=''):
    d = os.path.join(root, name)
    os.makedirs(d, exist_ok=True)
    open(os.path.join(d,'pom.xml'),'w').write(POM % dict(name=name, desc=desc.replace('&', '&amp;').replace('<', '&lt;').replace('>', '&gt;'), config=config, reporting=reporting))
    for fn, content in files.items():
        p = os.path.join(d, fn)
        os.makedirs(os.path.dirname(p), exist_ok=True)
        mode = 'wb' if isinstance(content, bytes) else 'w'
        open(p, mode).write(content)
    if 'invoker.properties' not in files: open(os.path.join(d,'invoker.properties'),'w').write('invoker.buildResult = %s\n' % ('failure' if fail else 'success'))
    v = '// %s\n' % desc
    v += 'def log = new File(basedir, "build.log").getText("UTF-8")\n'
    v += 'def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }\n'
    for e in expect:
        v += 'expect(%s)\n' % groovy(e)
    v += 'assert !(log =~ /(?m)^\\s+at [\\w.$]+\\(/) : "a stack trace reached the log"\n'
    v += extra_verify
    v += 'return true\n'
    open(os.path.join(d,'verify.groovy'),'w').write(v)
def groovy(s):
    return "'" + s.replace('\\','\\\\').replace("'", "\\'") + "'"

GOOD = {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs()}
project('clean-dataset-passes', 'True coefficients pass; reports are written.', GOOD,
        ['[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (2 forms, 24 coefficient rows'],
        fail=False, extra_verify='''def json = new File(basedir, "target/eigengate/report.json").getText("UTF-8")
assert json.contains('"passed": true')
def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.normalisation" name="data: form lev11_wt2_o1"/>')
''')
project('skip-property-skips', 'eigengate.skip skips even a broken dataset.', {'data/forms.csv': 'id,level\n'},
        ['[INFO] eigengate: skipped'], fail=False, config='\n        <configuration><skip>true</skip></configuration>')
bad = list(L11); bad[0] = 2
project('normalisation-fail', 'a_1 = 2 fails the normalisation check, naming file, line, form and n.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=bad)},
        ['[ERROR] data/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2; a newform is normalised so that a_1 = 1'],
        extra_verify='''def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.normalisation" name="data: form lev11_wt2_o1">')
assert xml.contains('<failure message="data/coefficients.csv:4: error [normalisation]')
def json = new File(basedir, "target/eigengate/report.json").getText("UTF-8")
assert json.contains('"check": "normalisation", "severity": "error", "file": "data/coefficients.csv", "line": 4')
''')
project('bad-integer-level', 'A level that is not an integer.',
        {'data/forms.csv': FORMS.replace('lev11_wt2_o1,11,', 'lev11_wt2_o1,eleven,'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:3:2: error [table-format] form=lev11_wt2_o1: expected an integer in [1, 2147483647], found eleven; 'level' must be a decimal integer"])
project('bad-level-range', 'Level 0 is out of range.',
        {'data/forms.csv': FORMS.replace('lev11_wt2_o1,11,', 'lev11_wt2_o1,0,'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:3:2: error [table-format] form=lev11_wt2_o1: expected an integer in [1, 2147483647], found 0; 'level' is out of range"])
project('bad-weight-range', 'Weight 0 is out of range.',
        {'data/forms.csv': FORMS.replace('lev23_wt2_o1,23,2,', 'lev23_wt2_o1,23,0,'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:3: error [table-format] form=lev23_wt2_o1: expected an integer in [1, 10000], found 0; 'weight' is out of range"])
b = list(L11); b[5] = '1/2'
project('bad-rational-value', 'A non-integer a_n for a form with rational coefficients.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b)},
        ["[ERROR] data/coefficients.csv:9:3: error [table-format] form=lev11_wt2_o1 n=6: expected an integer, found 1/2; the form has rational coefficients (no field), so a_n must be an integer"])
b = list(L23); b[2] = '2*x^^2'
project('bad-expression', 'An unparsable polynomial expression.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l23=b)},
        ["[ERROR] data/coefficients.csv:18:3: error [table-format] form=lev23_wt2_o1 n=3: expected a polynomial in x with rational coefficients or a vector [c0, ..., c1], found 2*x^^2; the expression cannot be read at character"])
b = list(L23); b[3] = '[-1, 1, 0]'
project('bad-vector-length', 'A power-basis vector with three entries in a quadratic field.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l23=b)},
        ["[ERROR] data/coefficients.csv:19:3: error [table-format] form=lev23_wt2_o1 n=4: expected a polynomial in x with rational coefficients or a vector [c0, ..., c1], found [-1, 1, 0]; the vector has 3 entries but the field has degree 2"])
project('unknown-form', 'Coefficient rows of a form that forms.csv does not declare.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(extra='lev37_wt2_o1,1,1\nlev37_wt2_o1,2,-2\n')},
        ["[ERROR] data/coefficients.csv:28:1: error [table-format] form=lev37_wt2_o1: expected a form id from forms.csv, found lev37_wt2_o1; no form with this id is declared; its rows are skipped"])
project('duplicate-coefficient', 'a_5 given twice with different values.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(extra='lev11_wt2_o1,5,-1\n')},
        ["[ERROR] data/coefficients.csv:28:3: error [table-format] form=lev11_wt2_o1 n=5: expected 1, found -1; a_5 is given twice with different values (first at data/coefficients.csv:8)"])
project('reducible-field', 'A field polynomial that factors over Q.',
        {'data/forms.csv': FORMS.replace('x^2 - x - 1', 'x^2 - 1'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found x^2 - 1; the field polynomial is reducible over Q: it factors as"])
project('nonmonic-field', 'A field polynomial that is not monic.',
        {'data/forms.csv': FORMS.replace('x^2 - x - 1', '2*x^2 - x - 1'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found 2*x^2 - x - 1; the field polynomial is not monic"])
project('nonintegral-field', 'A field polynomial with a non-integral coefficient.',
        {'data/forms.csv': FORMS.replace('x^2 - x - 1', 'x^2 - 1/2*x - 1'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found x^2 - 1/2*x - 1; the field polynomial has non-integral coefficients"])
project('missing-column', 'coefficients.csv without the value column.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': 'form,n\nlev11_wt2_o1,1\n'},
        ["[ERROR] data/coefficients.csv:1: error [table-format] table=data/coefficients.csv: expected a column 'value', found columns form,n; the column 'value' is required in data/coefficients.csv"])
project('empty-file', 'An empty forms.csv.',
        {'data/forms.csv': '', 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv: error [table-format] table=data/forms.csv: expected a header row, found an empty file; every table starts with a header row naming its columns"])
project('not-utf8', 'A coefficients file that is not UTF-8.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': b'form,n,value\nlev11_wt2_o1,1,1\nlev11_wt2_o1,2,\xff\xfe\n'},
        ["[ERROR] data/coefficients.csv:3: error [table-format] table=data/coefficients.csv: expected UTF-8 text, found bytes that are not UTF-8; line 3 is not valid UTF-8; it is not read"])
b6 = list(L11); b6[5] = '-2'
project('threads-and-cache', 'Two threads and a cache directory of its own: the planted error is reported as with one thread, and the cache is written.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b6)},
        ['[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)'],
        config='\n        <configuration><threads>2</threads><cacheDirectory>${project.build.directory}/gate-cache</cacheDirectory></configuration>',
        extra_verify='assert new File(basedir, "target/gate-cache").listFiles().length > 0 : "the cache was not written"\n')
project('missing-dataset', 'A configured dataset directory that does not exist.',
        {'README.md': 'The configured dataset directory tables/ is missing on purpose.\n'},
        ["[ERROR] tables: error [table-format] dataset=tables: expected a dataset directory, found nothing; the dataset directory does not exist"],
        config='\n        <configuration><datasets><dataset>${project.basedir}/tables</dataset></datasets></configuration>')
project('many-errors-collected', 'Every malformed row of a run is reported, not only the first.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=['1','x','-1','2','y','2','-2','0','-2','-2','1','z'])},
        ["[ERROR] eigengate: 3 errors", "data/coefficients.csv:5:3: error [table-format] form=lev11_wt2_o1 n=2",
         "data/coefficients.csv:8:3: error [table-format] form=lev11_wt2_o1 n=5",
         "data/coefficients.csv:15:3: error [table-format] form=lev11_wt2_o1 n=12"])
b = list(L11); b[5] = '-2'
project('hecke-fail-composite', 'A composite coefficient that breaks a_mn = a_m a_n is named with both sides.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b)},
        ['[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)'])
project('space-missing-orbit', 'A declared space with an orbit missing fails the dimension check.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(),
         'data/spaces.csv': '# S_2(Gamma0(11)) and S_2(Gamma0(23)) are complete here; S_2(Gamma0(37)) (dimension 2) is not\nlevel,weight\n11,2\n23,2\n37,2\n'},
        ['[ERROR] data/spaces.csv:5: error [space-dimension] space=N=37 k=2: expected dim S_k^new(Γ0(N)) = 2, found sum of field degrees = 0 (no forms); the declared forms do not fill the new subspace: an orbit is missing (or a field is too small)'],
        extra_verify='assert log.contains("[ERROR] eigengate: 1 error,") : "only the missing space fails"\n')
# dimensions from the Cohen-Oesterle formula, checked against PARI/GP 2.15.2: mfdim([13,2,Mod(4,13)],0) = 1 for the
# character 2:1/6 of order 6 (two characters in its Galois orbit); the Legendre symbol mod 7 is odd (7 = 3 mod 4)
project('space-character-fail', 'spaces.csv rows with characters: a Galois orbit with no forms, a malformed character, a weight of the wrong parity, weight 1.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(),
         'data/spaces.csv': '# S_2(Gamma0(11)) is complete; S_2(13, chi of order 6) is not; two malformed rows; weight 1 cannot be checked\nlevel,weight,character\n11,2,\n13,2,2:1/6\n13,4,2:1/5\n7,2,3:1/2\n23,1,5:1/2\n'},
        ['[ERROR] data/spaces.csv:5:3: error [table-format] space=line 5: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/5; the character cannot be read: χ(2) = exp(2πi·1/5) has order 5, which does not divide the order 12 of 2 mod 13',
         '[ERROR] data/spaces.csv:6:2: error [table-format] space=line 6: expected an odd weight (χ(−1) = -1 = (−1)^k), found 2; S_k(N, χ) = 0 unless χ(−1) = (−1)^k, since −I ∈ Γ0(N) acts on it by χ(−1)(−1)^k',
         '[ERROR] data/spaces.csv:4: error [space-dimension] space=N=13 k=2 χ=2:1/6: expected [Q(χ):Q]·dim S_k^new(N, χ) = 2·1 = 2, found sum of field degrees = 0 (no forms); the declared forms do not fill the new subspace: an orbit is missing (or a field is too small)',
         '[INFO] data/spaces.csv:7: note [space-dimension] space=N=23 k=1 χ=5:1/2: completeness of weight 1 not checkable: no formula gives dim S_1(N, χ), so the listing is neither passed nor failed'],
        extra_verify='assert log.contains("[ERROR] eigengate: 3 errors,") : "the complete trivial space passes"\n')
bad = list(L11); bad[0] = 2
project('skip-checks-property', 'eigengate.skipChecks turns a check off by its id.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=bad),
         'invoker.properties': 'invoker.userPropertiesFile = test.properties\ninvoker.buildResult = success\n',
         'test.properties': 'eigengate.skipChecks = normalisation,hecke-relations\n'},
        ['[INFO] eigengate: 0 errors'], fail=False)
project('unknown-skip-check', 'An unknown check id in skipChecks is a configuration error, not a data error.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(),
         'invoker.properties': 'invoker.goals = verify -Deigengate.skipChecks=no-such-check\ninvoker.buildResult = failure\n'},
        ["eigengate: unknown check 'no-such-check' in skipChecks; known checks: normalisation, field-sanity"])
project('datasets-by-property', 'eigengate.datasets takes comma-separated directories; each is checked.',
        {'tables-a/forms.csv': FORMS, 'tables-a/coefficients.csv': coeffs(),
         'tables-b/forms.csv': FORMS, 'tables-b/coefficients.csv': coeffs(l11=bad),
         'invoker.properties': 'invoker.userPropertiesFile = test.properties\ninvoker.buildResult = failure\n',
         'test.properties': 'eigengate.datasets = tables-a,tables-b\n'},
        # a_1 = 2 is one error: the prime-power recursion starts from a_p and a_1 = 1, not from the wrong a_1
        ['[ERROR] eigengate: 1 error, 0 warnings, 0 notes in 2 datasets (4 forms, 48 coefficient rows',
         '[ERROR] tables-b/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2'])
# a_n of the level-11 newform, n <= 20: OEIS A006571; PARI/GP 2.15.2: mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 20)
L11_20 = L11 + [4, 4, -1, -4, -2, 4, 0, 2]
# tau(n), n <= 12: OEIS A000594; PARI/GP 2.15.2: vector(12, n, ramanujantau(n))
TAU = [1, -24, 252, -1472, 4830, -6048, -16744, 84480, -113643, -115920, 534612, -370944]
FORMS2 = '# Delta and the newform of level 11\nid,level,weight\ndelta,1,12\nf11,11,2\n'
def coeffs2():
    s = ('# tau(n): OEIS A000594 (PARI/GP: ramanujantau(n)); level 11: OEIS A006571 (PARI/GP: mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 20))\n'
         'form,n,value\n')
    for i, v in enumerate(TAU): s += 'delta,%d,%d\n' % (i + 1, v)
    for i, v in enumerate(L11_20): s += 'f11,%d,%d\n' % (i + 1, v)
    return s
project('congruence-certified-with-certificate',
        'tau(l) = a_l(f11) mod 11 (a classical congruence, from memory; checked in PARI/GP) is certified from l <= 12 and a certificate is written.',
        {'data/forms.csv': FORMS2, 'data/coefficients.csv': coeffs2(),
         'data/congruences.csv': '# Delta = f11 mod 11: tau(l) = a_l(f11) mod 11 for l != 11\nform,other,p\ndelta,f11,11\n'},
        ['[INFO] data/congruences.csv:3: note [congruence] congruence=delta~f11 p=11: certified: a_l(delta) = l^0*a_l(f11) mod a prime above 11 for every prime l not dividing 11, having checked every l <= B = 12'],
        fail=False, extra_verify='''def cert = new File(basedir, "target/eigengate/certificates/congruence-delta-f11-p11.txt").getText("UTF-8")
assert cert.contains("bound B = floor(W*index/12): 12") : cert
assert cert.contains("sha256 ") && cert.contains("  coefficients.csv") : cert
assert cert.contains("  congruences.csv") : "the claim file is hashed too: " + cert
''')
project('weight-set-missing-weight',
        'A predicted weight set that drops a Serre weight fails, naming form, p and the missing weight (level 11 is supersingular at 19: a_19 = 0).',
        {'data/forms.csv': FORMS2, 'data/coefficients.csv': coeffs2(),
         'data/modp-weights.csv': 'form,p,serre_weight,weights\nf11,19,2,"(0,0)"\n'},
        ['[ERROR] data/modp-weights.csv:2:4: error [weight-set] form=f11 p=19: expected (0,0);(18,0), found (0,0); missing (18,0);'])

# ---- forms with a nontrivial character (issue: nebentypus) ----
# Values are taken from the committed PARI/GP fixture plugin/src/test/resources/datasets/characters/ (written by
# fixtures-gp/characters.gp: mfeigenbasis(mfinit([N,k,[znstar(N,1),chi]],0)), field = absolute field of Q(chi)(a_n),
# zeta = image of PARI's t), a_n for n <= 30.
CHAR_DIR = pathlib.Path(__file__).resolve().parent.parent.parent / 'plugin/src/test/resources/datasets/characters'
CHAR_FORMS = ['lev13_wt2_chi6_o1', 'lev21_wt2_chi6_o1', 'lev13_wt3_chi4_o1', 'lev7_wt3_chi2_o1', 'lev23_wt1_chi2_o1']
CHAR_N = 30
def char_rows():
    forms = {}
    for line in open(CHAR_DIR / 'forms.csv'):
        if line.startswith('#') or line.startswith('id,'): continue
        forms[line.split(',')[0]] = line.rstrip('\n')
    coeffs = {}
    for line in open(CHAR_DIR / 'coefficients.csv'):
        if line.startswith('#') or line.startswith('form,'): continue
        f, n, v = line.rstrip('\n').split(',', 2)
        coeffs.setdefault(f, {})[int(n)] = v
    return forms, coeffs
CHAR_SRC = ('# forms with a character, from plugin/src/test/resources/datasets/characters (PARI/GP 2.15.2, fixtures-gp/characters.gp):\n'
            '#   mfeigenbasis(mfinit([N,k,[znstar(N,1),chi]],0)); character G.gen[j]:chi[j]/G.cyc[j]; zeta = image of PARI\'s t\n')
def char_files(plant=None, forms_text=None):
    forms, coeffs = char_rows()
    ft = forms_text if forms_text is not None else CHAR_SRC + 'id,level,weight,character,field,zeta\n' + ''.join(forms[f] + '\n' for f in CHAR_FORMS)
    c = CHAR_SRC + 'form,n,value\n'
    lines = {}
    ln = c.count('\n')
    for f in CHAR_FORMS:
        for n in range(1, CHAR_N + 1):
            v = (plant or {}).get((f, n), coeffs[f][n])
            c += '%s,%d,%s\n' % (f, n, v)
            ln += 1
            lines[(f, n)] = ln
    return {'data/forms.csv': ft, 'data/coefficients.csv': c}, lines
files, _ = char_files()
project('character-dataset-passes',
        'Forms with characters of order 6 (one and two generators), 4 (a CM quartic field), 2 in odd weight 3 and in weight 1 pass every check.',
        files, ['[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (5 forms, 150 coefficient rows'], fail=False)
# lev13_wt2_chi6_o1: a_3 = 2*x - 2 replaced by its complex conjugate chi-bar(3)*a_3 = -2*x (chi(3) = -x)
files, lines = char_files({('lev13_wt2_chi6_o1', 3): '-2*x'})
project('character-conjugate-coefficient-fails',
        'An a_p replaced by its complex conjugate breaks conj(a_p) = chi-bar(p)a_p, which ramanujan-bound decides exactly.',
        files, ['[ERROR] data/coefficients.csv:%d: error [ramanujan-bound] form=lev13_wt2_chi6_o1 n=3: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 12], found a_p = -2*x, χ(p) = -x, χ̄(p)*a_p^2 with characteristic polynomial x^2 + 4*x + 16; χ̄(p)*a_p^2 is not real and >= 0 in every embedding, so conj(a_p) = χ̄(p)*a_p fails at p=3 (is a_p replaced by its complex conjugate, or χ(p) wrong?)' % lines[('lev13_wt2_chi6_o1', 3)]])
# lev13_wt2_chi6_o1: a_4 written with chi-bar(2) = 1 - x instead of chi(2) = x: a_2^2 - (1 - x)*2 = 5*x - 2 (true a_4 = x)
files, lines = char_files({('lev13_wt2_chi6_o1', 4): '5*x - 2'})
project('character-wrong-value-in-prime-square-fails',
        'A coefficient a_{p^2} computed with the wrong chi(p) fails the Hecke recursion with the character.',
        files, ['[ERROR] data/coefficients.csv:%d: error [hecke-relations] form=lev13_wt2_chi6_o1 n=4: expected x, found 5*x - 2; ' % lines[('lev13_wt2_chi6_o1', 4)]])
# lev13_wt3_chi4_o1: a_2 times the totally real unit 3 + sqrt(10) (gp: see CharactersTest): |a_2|^2 = 25.65 > 16 in one
# pair of embeddings of the CM field, 0.35 in the other
files, lines = char_files({('lev13_wt3_chi4_o1', 2): '2/21*x^3 + 5/21*x^2 - 5/7*x + 17/21'})
project('character-ramanujan-one-embedding-fails',
        'A Ramanujan-Petersson violation that shows in one pair of complex embeddings of a CM quartic field only.',
        files, ['[ERROR] data/coefficients.csv:%d: error [ramanujan-bound] form=lev13_wt3_chi4_o1 n=2: expected every embedding with χ̄(p)*a_p^2 real in [0, 4*p^(k-1)] = [0, 16], found a_p = 2/21*x^3 + 5/21*x^2 - 5/7*x + 17/21, χ(p) = ' % lines[('lev13_wt3_chi4_o1', 2)],
                '; Deligne\'s bound |a_p| <= 2 p^((k-1)/2) fails in some complex embedding at p=2'])
MALFORMED = ('id,level,weight,character,field,zeta\n'
             'notgen,13,2,4:1/6,x^2 - x + 1,x\n'
             'inconsistent,13,2,2:1/6;4:1/6,x^2 - x + 1,x\n'
             'order,13,2,2:1/5,x^2 - x + 1,x\n'
             'nozeta,13,2,2:2/12,x^2 - x + 1,\n'
             'smallzeta,13,2,2:2/12,x^2 - x + 1,x - 1\n'
             'parity,7,2,3:1/2,,\n'
             'nonunit,21,2,3:1/2;2:1/6,x^2 - x + 1,x\n')
project('character-cell-malformed-fails',
        'Each malformed character or zeta cell is a table-format error with file, line, column and what was expected.',
        {'data/forms.csv': MALFORMED},
        ['[ERROR] data/forms.csv:2:4: error [table-format] form=notgen: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 4:1/6; the generators do not generate (Z/13Z)^×: they reach 6 of its 12 elements',
         '[ERROR] data/forms.csv:3:4: error [table-format] form=inconsistent: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/6;4:1/6; the values are not those of a character',
         '[ERROR] data/forms.csv:4:4: error [table-format] form=order: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 2:1/5; χ(2) = exp(2πi·1/5) has order 5, which does not divide the order 12 of 2 mod 13',
         '[ERROR] data/forms.csv:5:6: error [table-format] form=nozeta: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found an empty cell; the cell is empty',
         '[ERROR] data/forms.csv:6:6: error [table-format] form=smallzeta: expected a root of unity of order 6 in the coefficient field (Φ_6(zeta) = 0), found x - 1; Φ_6(zeta) = -2*x + 2 ≠ 0',
         '[ERROR] data/forms.csv:7:3: error [table-format] form=parity: expected an odd weight, found 2; S_k(N, χ) = 0: χ(−1) = −1 but (−1)^k = 1',
         '[ERROR] data/forms.csv:8:4: error [table-format] form=nonunit: expected empty, 1, or g:a/b pairs joined by \';\' with units 1 < g < N that generate (Z/NZ)^×, found 3:1/2;2:1/6; 3 is not a unit g with 1 < g < 21'])
# ---- elliptic curves beside weight-2 forms (curves.csv)
# a_n, n <= 20, PARI/GP 2.15.2 (Debian pari-gp + pari-elldata): ellan(ellinit([0,-1,1,-10,-20]), 20) (level 11,
# also OEIS A006571) and ellan(ellinit([0,0,1,-1,0]), 20) (level 37, the class of rank 1)
L37_20 = [1, -2, -3, 2, -2, 6, -1, 0, 6, 4, -5, -6, -2, 2, 6, -4, 0, -12, 0, -4]
FORMS_EC = '# the rational newforms of level 11 and of level 37 (rank 1)\nid,level,weight\nf11,11,2\nf37,37,2\n'
def coeffs_ec():
    s = ('# PARI/GP 2.15.2: ellan(ellinit([0,-1,1,-10,-20]), 20) and ellan(ellinit([0,0,1,-1,0]), 20)\n'
         'form,n,value\n')
    for i, v in enumerate(L11_20): s += 'f11,%d,%d\n' % (i + 1, v)
    for i, v in enumerate(L37_20): s += 'f37,%d,%d\n' % (i + 1, v)
    return s
def curves_ec(rows):
    return ('# models from ellsearch (pari-elldata); torsion = elltors(ellinit(curve))[1]\n'
            'form,curve,torsion\n' + ''.join(rows))
EC_GOOD = ['f11,"[0,-1,1,-10,-20]",5\n', 'f11,"[0,-1,1,-7820,-263580]",1\n',
           '# [0,-1,1,-10,-20] after ellchangecurve(E, [1/6, -2, 1, 5]): not minimal at 2 and 3\n',
           'f11,"[12,-288,2376,-6480,-1959552]",5\n', 'f37,"[0,0,1,-1,0]",1\n']
project('curves-pass', 'Curves with the right conductor, a_p and torsion pass, a non-minimal model among them.',
        {'data/forms.csv': FORMS_EC, 'data/coefficients.csv': coeffs_ec(), 'data/curves.csv': curves_ec(EC_GOOD)},
        ['[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (2 forms, 40 coefficient rows'],
        fail=False, extra_verify='''def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.curve-traces" name="data: form f11"/>')
assert xml.contains('<testcase classname="eigengate.curve-conductor" name="data: form f37"/>')
''')
project('curves-twist-fail',
        'The quadratic twist by -4 of the right curve fails the traces check, which names the twist, and the conductor check (PARI/GP: ellminimalmodel(ellinit(elltwist(ellinit([0,-1,1,-10,-20]), -4))) = [0,1,0,-165,1427], conductor 176).',
        {'data/forms.csv': FORMS_EC, 'data/coefficients.csv': coeffs_ec(),
         'data/curves.csv': curves_ec(['f11,"[0,1,0,-165,1427]",\n'])},
        ['[ERROR] data/curves.csv:3:2: error [curve-traces] form=f11 p=2: expected a_2 = -2 (data/coefficients.csv:4), found a_2 = 0 (the curve); a_p of the curve [0,1,0,-165,1427] must equal a_p of the form (modularity); they differ at 4 of the 8 primes p ≤ 19 of the table; the curve looks like the twist by -4',
         '[ERROR] data/curves.csv:3:2: error [curve-conductor] form=f11 p=2: expected f_2 = 0 (level 11), found f_2 = 4 (Kodaira II*, c_2 = 1)'])
project('curves-other-class-fail',
        'A curve of the right conductor but another isogeny class fails the traces check at p = 2 (PARI/GP: ellap(ellinit([0,1,1,-23,-50]), 2) = 0).',
        {'data/forms.csv': FORMS_EC, 'data/coefficients.csv': coeffs_ec(),
         'data/curves.csv': curves_ec(['f37,"[0,1,1,-23,-50]",3\n'])},
        ['[ERROR] data/curves.csv:3:2: error [curve-traces] form=f37 p=2: expected a_2 = -2 (data/coefficients.csv:24), found a_2 = 0 (the curve); a_p of the curve [0,1,1,-23,-50] must equal a_p of the form (modularity); they differ at 7 of the 8 primes p ≤ 19 of the table',
         '[ERROR] eigengate: 1 error, 0 warnings, 0 notes in 1 dataset'])
project('curves-torsion-fail', 'A torsion order from another curve fails (PARI/GP: elltors(ellinit([0,-1,1,-10,-20]))[1] = 5).',
        {'data/forms.csv': FORMS_EC, 'data/coefficients.csv': coeffs_ec(),
         'data/curves.csv': curves_ec(['f11,"[0,-1,1,-10,-20]",1\n'])},
        ['[ERROR] data/curves.csv:3:3: error [curve-torsion] form=f11 torsion: expected 5, found 1; E(Q)_tors of [0,-1,1,-10,-20] has order 5'])
project('curves-singular-model', 'A singular cubic (discriminant 0) in curves.csv is a table-format error naming file, line and column.',
        {'data/forms.csv': FORMS_EC, 'data/coefficients.csv': coeffs_ec(),
         'data/curves.csv': curves_ec(['f11,"[0,0,0,-3,2]",\n'])},
        ['[ERROR] data/curves.csv:3:2: error [table-format] form=f11: expected a model with nonzero discriminant, found discriminant 0; the cubic [0,0,0,-3,2] is singular (a node or a cusp), not an elliptic curve'])
# ---- primes-only tables (issue: exactness, trace identities, Atkin-Lehner, diagnosis) ----
# Values: the committed fixture plugin/src/test/resources/datasets/primesonly (fixtures-gp/primesonly.gp, PARI/GP 2.15.2:
# mfcoefs(mfeigenbasis(mfinit([N,k,1],0))[i], 100) at n = 1 and primes; mfatkineigenvalues; lfunrootres(lfunmf(mf, f))).
PO = pathlib.Path(__file__).resolve().parent.parent.parent / 'plugin/src/test/resources/datasets/primesonly'
PO_FORMS = [l for l in (PO / 'forms.csv').read_text().splitlines() if l and not l.startswith('#')]
PO_COEFFS = [l for l in (PO / 'coefficients.csv').read_text().splitlines() if l and not l.startswith('#')]
PO_SRC = '# PARI/GP 2.15.2, fixtures-gp/primesonly.gp: a_1 and a_p (p <= 100) of mfeigenbasis(mfinit([N,k,1],0))[i]; atkin_lehner from mfatkineigenvalues, root_number from lfunrootres\n'
def primes_only(form_ids, plant=None, forms_edit=None):
    rows = [l for l in PO_COEFFS[1:] if l.split(',')[0] in form_ids]
    if plant:
        key = '%s,%d,' % (plant[0], plant[1])
        rows = [key + '"%s"' % plant[2] if r.startswith(key) else r for r in rows]
    forms = [PO_FORMS[0]] + [l for l in PO_FORMS[1:] if l.split(',')[0] in form_ids]
    ftext = PO_SRC + '\n'.join(forms) + '\n'
    if forms_edit:
        ftext = ftext.replace(*forms_edit)
    return ftext, PO_SRC + PO_COEFFS[0] + '\n' + '\n'.join(rows) + '\n'
def line_of(text, prefix):
    return [i + 1 for i, l in enumerate(text.split('\n')) if l.startswith(prefix)][0]
f29, c29 = primes_only(['lev29_wt2_o1'], plant=('lev29_wt2_o1', 7, '-2*x'))
project('primes-only-conjugate-named',
        'In a complete space given by a_p only, a_7 replaced by its Galois conjugate (same trace and norm) fails Σ Tr(a_p a_q) = Tr T_pq, and the finding names a_7 and the automorphism.',
        {'data/forms.csv': f29, 'data/coefficients.csv': c29,
         'data/spaces.csv': '# S_2^new(Gamma0(29)) is one orbit over Q(sqrt 2): complete\nlevel,weight\n29,2\n'},
        ['[ERROR] data/coefficients.csv:%d: error [space-trace-products] form=lev29_wt2_o1 n=7: expected 2*x, found -2*x; likely culprit: Σ_f Tr(a_p a_q) = Tr T_pq fails in space N=29 k=2 at pq = 2*7, 3*7, 7*11, 7*13, 7*17 and 14 more, all involving a_7; a_7 = 2*x in this form makes every identity at 7 hold (and Σ_f Tr(a_7^2) too); the value found is σ(2*x) for the automorphism σ: x ↦ -x of K' % line_of(c29, 'lev29_wt2_o1,7,'),
         '[ERROR] data/spaces.csv:3: error [space-trace-products] space=N=29 k=2 pq=2*7: expected Tr T_14 = 8, found Σ Tr(a_2 a_7) = -8;'])
f29n, c29n = primes_only(['lev29_wt2_o1'], plant=('lev29_wt2_o1', 97, '1/2*x - 4'))
project('field-sanity-nonintegral-charpoly',
        'a_97 = -4 + x/2 in Q(sqrt 2) has an integral trace but is not an algebraic integer: its characteristic polynomial is not in Z[x].',
        {'data/forms.csv': f29n, 'data/coefficients.csv': c29n},
        ['[ERROR] data/coefficients.csv:%d: error [field-sanity] form=lev29_wt2_o1 n=97: expected a characteristic polynomial in Z[x], found charpoly(a_n) = x^2 + 8*x + 31/2; a_n is not an algebraic integer: its trace is -8 but its characteristic polynomial over Q has a non-integral coefficient (Cohen GTM 138 §4.3)' % line_of(c29n, 'lev29_wt2_o1,97,')])
f30, c30 = primes_only(['lev30_wt2_o1'], forms_edit=('lev30_wt2_o1,30,2,,,2:+1;', 'lev30_wt2_o1,30,2,,,2:-1;'))
project('atkin-lehner-sign-fail',
        'A wrong Atkin-Lehner sign at 2 || 30 contradicts a_2, the root number and the count of signs in the complete space.',
        {'data/forms.csv': f30, 'data/coefficients.csv': c30,
         'data/spaces.csv': '# S_2^new(Gamma0(30)) is one rational orbit: complete\nlevel,weight\n30,2\n'},
        ['[ERROR] data/coefficients.csv:%d: error [atkin-lehner] form=lev30_wt2_o1 q=2: expected a_2 = 1, found a_2 = -1 with w_2 = -1;' % line_of(c30, 'lev30_wt2_o1,2,'),
         '[ERROR] data/forms.csv:3:7: error [atkin-lehner] form=lev30_wt2_o1 root_number: expected -1, found +1;',
         '[ERROR] data/spaces.csv:3: error [atkin-lehner-count] space=N=30 k=2 q=2: expected 1 with w_2 = +1, 0 with -1, found 0 with +1, 1 with -1 (lev30_wt2_o1:-1);'])
b = list(L11); b[1] = 2
project('hecke-culprit-named',
        'a_2 = 2 instead of -2 breaks a_6 and a_10 (a_4 = a_2^2 - 2, a_8 and a_12 do not see the sign); one finding names a_2 with the value that satisfies them all, then the two follow.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b)},
        ['[ERROR] data/coefficients.csv:5: error [hecke-relations] form=lev11_wt2_o1 n=2: expected -2, found 2; likely culprit: 2 relations fail, all involve a_2 (n = 6, 10); a_2 = -2 satisfies every relation it enters',
         '[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected -2, found 2; a_mn = a_m a_n for coprime m=2, n=3, a_2=2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)',
         '[ERROR] data/coefficients.csv:13: error [hecke-relations] form=lev11_wt2_o1 n=10: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=5, a_2=2, a_5=1 (Diamond–Shurman Prop. 5.8.5)'])
project('congruence-false-other-twist',
        'tau(l) = l^3 a_l(f11) mod 5 is false, and the finding says that twist 1 makes it hold (tau(l) = l(1 + l) = l a_l(f11) mod 5).',
        {'data/forms.csv': FORMS2, 'data/coefficients.csv': coeffs2(),
         'data/congruences.csv': '# false on purpose: the twist that holds is 1\nform,other,p,twist\ndelta,f11,5,3\n'},
        ['[ERROR] data/congruences.csv:3: error [congruence] congruence=delta~f11 p=5 j=3: expected a_2(delta) = 2^3*a_2(f11) = 4 mod (5, x) and (5, x), found a_2(delta) = 1; the congruence fails at l = 2, the first prime l not dividing 55 where the residues differ; it holds for every tabulated l <= 12 with twist j = 1 instead (mod (5, x) and (5, x))'])
f37, c37 = primes_only(['lev37_wt2_o1'])
c37dup = c37 + '\n'.join(l.replace('lev37_wt2_o1,', 'again,') for l in c37.split('\n') if l.startswith('lev37_wt2_o1,')) + '\n'
project('duplicate-orbit-named', 'One orbit listed twice under two ids is named as a duplicated orbit.',
        {'data/forms.csv': f37 + 'again,37,2,,,37:-1,+1\n', 'data/coefficients.csv': c37dup},
        ['[ERROR] data/forms.csv:4: error [duplicate-orbit] form=again: expected a newform differing from lev37_wt2_o1, found the same 26 coefficients as lev37_wt2_o1 (data/forms.csv:3); a duplicated orbit: distinct newforms of one space differ at some a_p (multiplicity one), so again repeats lev37_wt2_o1'])
# --- issue 11: the HTML report, failOnError / failOnWarning, the help goal, the site page
b = list(L11); b[5] = '-2'
project('html-report-of-failing-dataset', 'A failing run writes report.html: the verdict, the finding by anchor, a plot per form.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b)},
        ['[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2;',
         'full report in target/eigengate/report.html'],
        extra_verify='''def html = new File(basedir, "target/eigengate/report.html").getText("UTF-8")
assert html.startsWith("<!DOCTYPE html>")
assert html.contains('<h1 id="verdict" class="eg-verdict">') && html.contains("Failing: 1 error in the tables")
assert html.contains('<tr id="finding-1" class="eg-finding eg-row-error" data-check="hecke-relations"')
assert (html =~ /<svg [^>]*class="eg-plot eg-scatter"/).size() == 2 : "one plot per form"
assert !html.contains("<link") && !html.contains("src=") : "self-contained"
''')
bad = list(L11); bad[0] = 2
project('fail-on-error-false-reports-only', 'failOnError=false reports the errors and writes the reports but lets the build pass.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=bad),
         'invoker.properties': 'invoker.goals = verify -Deigengate.failOnError=false\ninvoker.buildResult = success\n'},
        ['[ERROR] data/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2',
         '[WARNING] eigengate: failOnError is false: the build goes on despite 1 error (listed above; full report in target/eigengate/report.html)'],
        fail=False)
FORMS_EXTRA = FORMS.replace('id,level,weight,character,field', 'id,level,weight,character,field,remark').replace(',x^2 - x - 1', ',x^2 - x - 1,').replace('lev11_wt2_o1,11,2,,', 'lev11_wt2_o1,11,2,,,')
project('fail-on-warning-fails-on-a-warning', 'failOnWarning=true fails the build on a warning (here: an unknown column).',
        {'data/forms.csv': FORMS_EXTRA, 'data/coefficients.csv': coeffs(),
         'invoker.properties': 'invoker.goals = verify -Deigengate.failOnWarning=true\ninvoker.buildResult = failure\n'},
        ['[INFO] eigengate: 0 errors, 1 warning, 0 notes in 1 dataset',
         'eigengate: 0 errors and 1 warning in the data (listed above; full report in target/eigengate/report.html); failOnWarning is set'])
project('help-goal-lists-goals', 'mvn eigengate:help (prefix from the plugin in the pom) lists the goals check, report and help.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(),
         'invoker.properties': 'invoker.goals = eigengate:help -Ddetail=false\ninvoker.buildResult = success\n'},
        ['eigengate:check', 'eigengate:help', 'eigengate:report'], fail=False)
REPORTING = '''
  <reporting>
    <plugins>
      <plugin>
        <groupId>@project.groupId@</groupId>
        <artifactId>eigengate-maven-plugin</artifactId>
        <version>@project.version@</version>
      </plugin>
    </plugins>
  </reporting>'''
SITE_POM = '''
      </plugin>
      <plugin>
        <artifactId>maven-site-plugin</artifactId>
        <version>3.21.0</version>'''
ex = pathlib.Path(__file__).resolve().parent.parent.parent / 'example-project' / 'data'
EXAMPLE = {'data/' + f.name: f.read_text(encoding='utf-8') for f in sorted(ex.iterdir()) if f.suffix == '.csv'}
project('site-report-page', 'mvn site gives the site an Eigengate page (the example project tables) with report.html beside it.',
        dict(EXAMPLE, **{'invoker.properties': 'invoker.goals = site\ninvoker.buildResult = success\n'}),
        [], fail=False, config=SITE_POM, reporting=REPORTING,
        extra_verify='''def page = new File(basedir, "target/site/eigengate.html").getText("UTF-8")
assert page.contains("Eigengate: passing") : page
assert page.contains("0 errors, 0 warnings") : page
assert page.contains('href="eigengate/report.html"') : page
def html = new File(basedir, "target/site/eigengate/report.html").getText("UTF-8")
assert html.contains("Passing: no error in the tables")
''')
b = list(L11); b[5] = '-2'
CLI_VERIFY = '''// the shaded command line the reactor built (plugin/target), run on the data directory as a non-Maven repository would
def dir = new File(basedir, "../../../../plugin/target").canonicalFile
def jars = dir.listFiles().findAll { it.name.endsWith("-cli.jar") }
assert jars.size() == 1 : "one -cli jar in " + dir + ": " + jars
def java = new File(System.getProperty("java.home"), "bin/java").path
def run = { List args ->
    def p = ([java, "-jar", jars[0].path] + args).execute(null, basedir)
    def out = new StringBuilder(), err = new StringBuilder()
    p.waitForProcessOutput(out, err)
    [p.exitValue(), out.toString(), err.toString()]
}
def (code, out, err) = run(["data"])
assert code == 1 : "exit " + code + "\\n" + out + err
assert out.readLines() == [
    "[ERROR] eigengate: 1 error, 0 warnings, 0 notes in 1 dataset (2 forms, 24 coefficient rows, 22 checks)",
    "[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)",
    "[ERROR] eigengate: report in target/eigengate/report.html"] : out
assert err == "" : "no progress line when stderr is not a terminal: " + err
assert new File(basedir, "target/eigengate/report.html").text.contains("Failing: 1 error in the tables")
def (helpCode, help, helpErr) = run(["--help"])
assert helpCode == 0 && help.startsWith("Usage: eigengate ")
def (badCode, badOut, badErr) = run(["no-such-dir"])
assert badCode == 2 && badErr.startsWith("eigengate: not a dataset directory: no-such-dir")
'''
project('cli-jar-gates-a-directory', 'The -cli jar (java -jar) gates a data directory with the goal\'s lines and exit codes 1, 0, 2.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b),
         'invoker.properties': 'invoker.goals = validate\ninvoker.buildResult = success\n'},
        [], fail=False, extra_verify=CLI_VERIFY)
