mkbundle () 
{ 
    local n=$1;
    mkdir -p $n/META-INF $n/src $n/src-test;
    cat > $n/META-INF/MANIFEST.MF <<EOF
Manifest-Version: 1.0
Bundle-ManifestVersion: 2
Bundle-Name: $2
Bundle-SymbolicName: $n
Bundle-Version: 0.1.0.qualifier
Bundle-Vendor: Limen
Automatic-Module-Name: $n
Bundle-RequiredExecutionEnvironment: JavaSE-17
EOF

    [ -n "$3" ] && printf 'Require-Bundle: %s\n' "$3" >> $n/META-INF/MANIFEST.MF;
    [ -n "$4" ] && printf 'Export-Package: %s\n' "$4" >> $n/META-INF/MANIFEST.MF;
    cat > $n/build.properties <<'EOF'
source.. = src/
output.. = bin/
bin.includes = META-INF/,\
               .
EOF

    cat > $n/.classpath <<'EOF'
<?xml version="1.0" encoding="UTF-8"?>
<classpath>
	<classpathentry kind="con" path="org.eclipse.jdt.launching.JRE_CONTAINER/org.eclipse.jdt.internal.debug.ui.launcher.StandardVMType/JavaSE-17"/>
	<classpathentry kind="con" path="org.eclipse.pde.core.requiredPlugins"/>
	<classpathentry kind="src" path="src"/>
	<classpathentry kind="src" output="bin-test" path="src-test">
		<attributes>
			<attribute name="test" value="true"/>
		</attributes>
	</classpathentry>
	<classpathentry kind="con" path="org.eclipse.jdt.junit.JUNIT_CONTAINER/5"/>
	<classpathentry kind="output" path="bin"/>
</classpath>
EOF

    cat > $n/.project <<EOF
<?xml version="1.0" encoding="UTF-8"?>
<projectDescription>
	<name>$n</name>
	<comment></comment>
	<projects></projects>
	<buildSpec>
		<buildCommand><name>org.eclipse.jdt.core.javabuilder</name><arguments></arguments></buildCommand>
		<buildCommand><name>org.eclipse.pde.ManifestBuilder</name><arguments></arguments></buildCommand>
		<buildCommand><name>org.eclipse.pde.SchemaBuilder</name><arguments></arguments></buildCommand>
	</buildSpec>
	<natures>
		<nature>org.eclipse.pde.PluginNature</nature>
		<nature>org.eclipse.jdt.core.javanature</nature>
	</natures>
</projectDescription>
EOF

}
