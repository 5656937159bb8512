// failOnViolation=false: the same findings are printed, the build passes with a warning.
def log = new File(basedir, 'build.log').text
assert log =~ /(?m)^\[ERROR\] src\/vibration\/tower-fan\.json:9:5: IT-2 SEP separation: /
assert log.contains('[WARNING] resonance-gate: 1 spec failed; failOnViolation=false, not failing the build')
assert log.contains('BUILD SUCCESS')
return true
