#!/bin/sh
# Regenerates the INVENTED demo rig data (fluids-data/examples/demo-rig-points.csv) or a large
# benchmark file: sh src/jmh/rig-data.sh demo | sh src/jmh/rig-data.sh rows N OUT.csv
set -e
cd "$(dirname "$0")/../.."
mvn -B -q -Pjmh test-compile dependency:build-classpath -Dmdep.outputFile=target/jmh-classpath.txt >/dev/null
CP="target/classes:target/test-classes:$(cat target/jmh-classpath.txt)"
if [ "$1" = demo ]; then
  java -cp "$CP" org.headway.project.RigDataGenerator demo fluids-data/examples/demo-rig-points.csv
else
  java -cp "$CP" org.headway.project.RigDataGenerator "$@"
fi
