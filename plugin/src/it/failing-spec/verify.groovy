// The failing spec: its natural frequency (24.03 Hz) lies inside the running band (23.3-25 Hz),
// so separation fails and the build with it, naming the file, line and column of the criterion.
def log = new File(basedir, 'build.log').text
assert log =~ /(?m)^\[ERROR\] src\/vibration\/tower-fan\.json:9:5: IT-2 SEP separation: /
assert log.contains('[ERROR] 1 spec: 0 pass, 1 fail, 0 error; 1 criterion failed')
assert log.contains('resonance-gate: 1 spec failed')
assert log.contains('BUILD FAILURE')
// the record is written before the build fails
def json = new groovy.json.JsonSlurper().parse(new File(basedir, 'target/resonance-gate/results.json'))
assert json.specs[0].status == 'fail'
assert json.specs[0].checks[0].value == 0
return true
