// The report goal on the failing spec (24.03 Hz inside the 23.3-25 Hz band, from f_n = sqrt(k/m)/(2 pi)):
// the same findings are printed and written, and the build still passes.
def log = new File(basedir, 'build.log').text
assert log =~ /(?m)^\[ERROR\] src\/vibration\/tower-fan\.json:9:5: IT-2 SEP separation: /
assert log =~ /\[WARNING\] resonance-gate: 1 spec failed; see target\/resonance-gate\/\S+ \(the report goal does not fail the build\)/
assert log =~ /\[INFO\] resonance-gate: report: target\/resonance-gate\/\S+/
assert log.contains('BUILD SUCCESS')
def out = new File(basedir, 'target/resonance-gate')
['results.json', 'summary.md', 'results.sarif', 'junit.xml'].each { assert new File(out, it).isFile() : it }
// JUnit XML as a CI server reads it
def suites = new groovy.xml.XmlSlurper().parse(new File(out, 'junit.xml'))
assert suites.@tests == '1' && suites.@failures == '1' && suites.@errors == '0'
assert suites.testsuite[0].@name == 'src/vibration/tower-fan.json'
assert suites.testsuite[0].testcase[0].@classname == 'IT-2'
// SARIF points at the criterion's line and column
def sarif = new groovy.json.JsonSlurper().parse(new File(out, 'results.sarif'))
assert sarif.version == '2.1.0'
def result = sarif.runs[0].results[0]
assert result.ruleId == 'separation' && result.level == 'error'
assert result.locations[0].physicalLocation.artifactLocation.uri == 'src/vibration/tower-fan.json'
assert result.locations[0].physicalLocation.region.startLine == 9
assert result.locations[0].physicalLocation.region.startColumn == 5
def md = new File(out, 'summary.md').text
assert md.contains('| fail | IT-2 | SEP | separation | src/vibration/tower-fan.json:9:5 |')
return true
