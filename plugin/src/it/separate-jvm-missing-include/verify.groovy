// The include names a file that is not there; the separate JVM says so and the build stops with
// the message Maven's JVM would give, naming the include and what to do.
def log = new File(basedir, 'build.log').text
assert log.contains('[INFO] resonance-gate: checking in a separate JVM')
assert log.contains('resonance-gate: includes name [chiller-pmp.json] but no such file is in src/vibration;'
        + ' correct the name (paths are relative to specDirectory), or drop it from includes')
assert log.contains('BUILD FAILURE')
def out = new File(basedir, 'target/resonance-gate')
assert !out.exists() || out.list().findAll { it.startsWith('separate-jvm') }.isEmpty()
return true
