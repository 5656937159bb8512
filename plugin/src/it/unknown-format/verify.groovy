// An unknown format name stops the build with a message that names it and suggests the near one.
def log = new File(basedir, 'build.log').text
assert log.contains("resonance-gate: unknown report format 'sarf'; did you mean 'sarif'? Known formats: json, ")
assert log.contains('Fix resonance-gate.formats (a comma-separated list), or leave it out to write every format')
assert log.contains('BUILD FAILURE')
assert !new File(basedir, 'target/resonance-gate').exists()
return true
