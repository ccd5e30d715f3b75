# Trendwright: build with Maven, run on a JRE as an unprivileged user.
#   docker build -t trendwright .
#   docker run -p 7070:7070 -v trendwright-data:/var/lib/trendwright trendwright
# For a shared PostgreSQL store add: -e TRENDWRIGHT_DATABASE_URL=jdbc:postgresql://db:5432/trendwright?user=tw

FROM maven:3.9-eclipse-temurin-17 AS build
WORKDIR /src
# Dependencies first, in a layer of their own that a source change does not invalidate.
COPY pom.xml ./
RUN mvn -B -q dependency:go-offline
# Everything the jar is built from: the code, the demo series and the browser page (web/ is packed
# into the jar; without it the server refuses to start, as its static files would be missing).
COPY src ./src
COPY demo-data ./demo-data
COPY web ./web
# Not offline (-o): go-offline does not fetch every plugin dependency a build resolves at run time.
RUN mvn -B -q package -DskipTests

FROM eclipse-temurin:17-jre
RUN groupadd --system --gid 10001 trendwright \
 && useradd --system --uid 10001 --gid trendwright --home-dir /var/lib/trendwright --shell /usr/sbin/nologin trendwright \
 && mkdir -p /var/lib/trendwright /opt/trendwright \
 && chown trendwright:trendwright /var/lib/trendwright
COPY --from=build /src/target/trendwright.jar /opt/trendwright/trendwright.jar
# Inside a container the server must listen beyond the loopback interface to be reachable.
ENV TRENDWRIGHT_HOST=0.0.0.0 \
    TRENDWRIGHT_PORT=7070 \
    TRENDWRIGHT_DATA_DIR=/var/lib/trendwright
VOLUME ["/var/lib/trendwright"]
EXPOSE 7070
USER trendwright
WORKDIR /var/lib/trendwright
HEALTHCHECK --interval=30s --timeout=5s --start-period=20s --retries=3 \
  CMD ["java", "-cp", "/opt/trendwright/trendwright.jar", "org.trendwright.app.HealthProbe"]
# exec form: the JVM is PID 1 and gets SIGTERM, so the shutdown hook stops gracefully. The JVM
# options are README's for a team server (throughput collector, huge pages for the heap).
ENTRYPOINT ["java", "-XX:+UseParallelGC", "-XX:+UseTransparentHugePages", "-jar", "/opt/trendwright/trendwright.jar"]
