// -Dresonance-gate.jvm=separate: the check runs in a JVM started for it, and the build reads the
// same as the failing-spec and summary-file runs in Maven's JVM: the finding with its file, line
// and column, the count line, the failure, the reports and the summary copy; no scratch is left.
def log = new File(basedir, 'build.log').text
assert log.contains('[INFO] resonance-gate: checking in a separate JVM (-XX:TieredStopAtLevel=1')
assert log =~ /(?m)^\[ERROR\] src\/vibration\/tower-fan\.json:9:5: IT-2 SEP separation: /
assert log.contains('[ERROR] 1 spec: 0 pass, 1 fail, 0 error; 1 criterion failed')
assert log.contains('resonance-gate: 1 spec failed')
assert log.contains('BUILD FAILURE')
def json = new groovy.json.JsonSlurper().parse(new File(basedir, 'target/resonance-gate/results.json'))
assert json.specs[0].status == 'fail'
def text = new File(basedir, 'target/ci/job-summary.md').text
assert text.startsWith('### resonance-gate: separate-jvm\n')
assert text.contains('| fail | IT-2 | SEP | separation | src/vibration/tower-fan.json:9:5 |')
def left = new File(basedir, 'target/resonance-gate').list().findAll { it.startsWith('separate-jvm') }
assert left.isEmpty() : "scratch left behind: ${left}"
return true
