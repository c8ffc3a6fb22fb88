/**
 * The deployment files read statically (no cluster, no Docker engine here): every Kubernetes manifest and
 * docker/compose.yaml against the schema of the fields it uses, then the cross-references that break a
 * deployment silently when one file changes without the other.
 */

import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import {
  composeFile,
  cpuQuantity,
  dockerfileStages,
  kubernetesFolder,
  kubernetesManifests,
  memoryQuantity,
  composeDuration,
  readText,
  type Container,
  type KubernetesManifest,
} from './deployment-files.js';

const APP_LABELS = { 'app.kubernetes.io/name': 'memberproof' };

const packageVersion = z.object({ version: z.string() }).parse(JSON.parse(readText('package.json'))).version;

/** The process's own grace after SIGTERM, in seconds, read from where it is defined. */
function shutdownGraceSeconds(): number {
  const match = /const SHUTDOWN_GRACE_MS = ([\d_]+);/.exec(readText('src', 'main.ts'));
  if (!match?.[1]) throw new Error('SHUTDOWN_GRACE_MS = <number>; not found in src/main.ts');
  return Number(match[1].replaceAll('_', '')) / 1000;
}

/** Whether src/main.ts reads this environment variable (process.env.NAME or by its quoted name). */
function serviceReads(name: string): boolean {
  const main = readText('src', 'main.ts');
  return main.includes(`process.env.${name}`) || main.includes(`'${name}'`);
}

function onlyOne<K extends KubernetesManifest['kind']>(kind: K): Extract<KubernetesManifest, { kind: K }> {
  const found = kubernetesManifests()
    .map(({ manifest }) => manifest)
    .filter((manifest): manifest is Extract<KubernetesManifest, { kind: K }> => manifest.kind === kind);
  expect(found, `${kind} manifests in deploy/kubernetes`).toHaveLength(1);
  return found[0] as Extract<KubernetesManifest, { kind: K }>;
}

function theContainer(): Container {
  const containers = onlyOne('Deployment').spec.template.spec.containers;
  expect(containers).toHaveLength(1);
  return containers[0] as Container;
}

function environmentValue(container: Container, name: string): string | undefined {
  return container.env?.find((variable) => variable.name === name)?.value;
}

/** The container port a probe or a Service targets: by name or by number. */
function containerPortOf(container: Container, port: string | number): number | undefined {
  return container.ports.find((declared) => declared.name === port || declared.containerPort === port)?.containerPort;
}

function runtimeStage() {
  const stages = dockerfileStages(readText('Dockerfile'));
  expect(stages.length).toBeGreaterThan(0);
  return stages.at(-1) ?? [];
}

function argumentsOf(keyword: string): string[] {
  return runtimeStage()
    .filter((instruction) => instruction.keyword === keyword)
    .map((instruction) => instruction.arguments);
}

/** The script the Dockerfile's HEALTHCHECK runs with node -e. */
function dockerfileHealthScript(): string {
  const [healthcheck] = argumentsOf('HEALTHCHECK');
  const script = /\bCMD\s+node\s+-e\s+"(.+)"$/.exec(healthcheck ?? '')?.[1];
  if (!script) throw new Error(`no HEALTHCHECK ... CMD node -e "<script>" in the runtime stage (found: ${healthcheck})`);
  return script;
}

describe('the schema helpers', () => {
  it('read Kubernetes quantities and compose durations in SI units', () => {
    // 1 Mi = 2^20 bytes, 1 G = 10^9 bytes, 1 m CPU = 1/1000 core.
    expect(cpuQuantity.parse('500m')).toBe(0.5);
    expect(cpuQuantity.parse('1')).toBe(1);
    expect(memoryQuantity.parse('256Mi')).toBe(268435456);
    expect(memoryQuantity.parse('1G')).toBe(1e9);
    expect(memoryQuantity.safeParse('256MB').success).toBe(false);
    expect(composeDuration.parse('1m30s')).toBe(90);
    expect(composeDuration.safeParse('40').success).toBe(false);
  });

  it('split a Dockerfile into stages and join continuation lines', () => {
    const stages = dockerfileStages('FROM a AS build\nRUN x \\\n  y\n# note\nFROM b\nUSER node\n');
    expect(stages.map((stage) => stage.map(({ keyword }) => keyword))).toEqual([['FROM', 'RUN'], ['FROM', 'USER']]);
    expect(stages[0]?.[1]?.arguments).toBe('x y');
  });
});

describe('deploy/kubernetes', () => {
  it('every YAML file parses and matches the schema of its kind', () => {
    const kinds = kubernetesManifests().map(({ file, manifest }) => `${file}: ${manifest.kind}`);
    expect(kinds).toEqual([
      'deployment.yaml: Deployment',
      'hpa.yaml: HorizontalPodAutoscaler',
      'kustomization.yaml: Kustomization',
      'pdb.yaml: PodDisruptionBudget',
      'service.yaml: Service',
    ]);
  });

  it('the kustomization lists every other manifest in the folder', () => {
    const others = readdirSync(kubernetesFolder).filter((file) => /\.ya?ml$/.test(file) && file !== 'kustomization.yaml');
    expect([...onlyOne('Kustomization').resources].sort()).toEqual(others.sort());
  });

  it('the Deployment, Service, disruption budget and spread constraint select the pod labels', () => {
    const deployment = onlyOne('Deployment');
    const podLabels = deployment.spec.template.metadata.labels;
    expect(podLabels).toMatchObject(APP_LABELS);
    const selectors = {
      deployment: deployment.spec.selector.matchLabels,
      service: onlyOne('Service').spec.selector,
      pdb: onlyOne('PodDisruptionBudget').spec.selector.matchLabels,
      ...Object.fromEntries((deployment.spec.template.spec.topologySpreadConstraints ?? []).map((constraint, index) => [`spread ${index}`, constraint.labelSelector.matchLabels])),
    };
    for (const [owner, selector] of Object.entries(selectors)) {
      expect(Object.keys(selector).length, `${owner} selector is empty`).toBeGreaterThan(0);
      expect(podLabels, `${owner} selector`).toMatchObject(selector);
    }
  });

  it('the Service sends port 80 to the container port by its name', () => {
    const [port, ...more] = onlyOne('Service').spec.ports;
    expect(more).toEqual([]);
    expect(port?.port).toBe(80);
    expect(port?.targetPort).toBe('http');
    expect(containerPortOf(theContainer(), port?.targetPort ?? '')).toBe(3000);
  });

  it('the autoscaler scales the Deployment by name on 70 % CPU, between 2 and 10, never under what the budget needs', () => {
    const deployment = onlyOne('Deployment');
    const { spec } = onlyOne('HorizontalPodAutoscaler');
    expect(spec.scaleTargetRef).toEqual({ apiVersion: 'apps/v1', kind: 'Deployment', name: deployment.metadata.name });
    expect(spec.metrics).toEqual([{ type: 'Resource', resource: { name: 'cpu', target: { type: 'Utilization', averageUtilization: 70 } } }]);
    expect([spec.minReplicas, spec.maxReplicas]).toEqual([2, 10]);
    expect(deployment.spec.replicas).toBeGreaterThanOrEqual(spec.minReplicas);
    expect(deployment.spec.replicas).toBeLessThanOrEqual(spec.maxReplicas);
    // A budget of minAvailable pods blocks every drain unless at least one more pod runs.
    expect(spec.minReplicas).toBeGreaterThan(onlyOne('PodDisruptionBudget').spec.minAvailable);
  });

  it('the probes ask /readyz and /healthz on the container port', () => {
    const container = theContainer();
    const probes = { readiness: container.readinessProbe, liveness: container.livenessProbe, ...(container.startupProbe ? { startup: container.startupProbe } : {}) };
    expect(probes.readiness.httpGet.path).toBe('/readyz');
    expect(probes.liveness.httpGet.path).toBe('/healthz');
    if (probes.startup) expect(probes.startup.httpGet.path).toBe('/healthz');
    for (const [name, probe] of Object.entries(probes)) {
      expect(containerPortOf(container, probe.httpGet.port), `${name} probe port`).toBe(3000);
    }
  });

  it('the liveness probe waits longer than the event-loop delay at which the service sheds load', () => {
    const container = theContainer();
    const maximumDelayMs = Number(environmentValue(container, 'MAX_EVENT_LOOP_DELAY_MS') ?? 1000);
    // Kubernetes' default timeout is 1 s.
    expect((container.livenessProbe.timeoutSeconds ?? 1) * 1000).toBeGreaterThan(maximumDelayMs);
  });

  it('the process listens on every interface, on the declared container port', () => {
    const container = theContainer();
    expect(container.ports.map(({ name, containerPort }) => ({ name, containerPort }))).toEqual([{ name: 'http', containerPort: 3000 }]);
    expect(environmentValue(container, 'HOST')).toBe('0.0.0.0');
    const imagePort = /(?:^|\s)PORT=(\d+)/.exec(argumentsOf('ENV').join(' '))?.[1];
    expect(Number(environmentValue(container, 'PORT') ?? imagePort ?? 3000)).toBe(container.ports[0]?.containerPort);
  });

  it('every environment variable set is one the service reads', () => {
    const names = (theContainer().env ?? []).map(({ name }) => name);
    expect(names).toEqual(expect.arrayContaining(['HOST', 'MAX_EVENT_LOOP_DELAY_MS', 'MAX_HEAP_USED_BYTES', 'MAX_RSS_BYTES']));
    expect(names.filter((name) => !serviceReads(name))).toEqual([]);
  });

  it('the termination grace outlasts the preStop sleep plus the service shutdown grace', () => {
    const { spec } = onlyOne('Deployment').spec.template;
    const command = theContainer().lifecycle?.preStop.exec.command ?? [];
    expect(command).toHaveLength(2);
    expect(command[0]).toMatch(/^(\/bin\/)?sleep$/);
    const sleepSeconds = Number(command[1]);
    expect(sleepSeconds).toBeGreaterThanOrEqual(1);
    expect(shutdownGraceSeconds()).toBeGreaterThan(0);
    expect(spec.terminationGracePeriodSeconds).toBeGreaterThan(shutdownGraceSeconds() + sleepSeconds);
  });

  it('the container runs as uid 1000, non-root, read-only, without privileges or capabilities', () => {
    const pod = onlyOne('Deployment').spec.template.spec;
    const own = theContainer().securityContext;
    // A container's own setting wins over the pod's.
    expect(own.runAsNonRoot ?? pod.securityContext?.runAsNonRoot).toBe(true);
    expect(own.runAsUser ?? pod.securityContext?.runAsUser).toBe(1000);
    expect((own.seccompProfile ?? pod.securityContext?.seccompProfile)?.type).toBe('RuntimeDefault');
    expect(own.readOnlyRootFilesystem).toBe(true);
    expect(own.allowPrivilegeEscalation).toBe(false);
    expect(own.capabilities?.drop).toEqual(['ALL']);
    expect(own.capabilities?.add ?? []).toEqual([]);
    expect(pod.automountServiceAccountToken).toBe(false);
  });

  it('the read-only root filesystem leaves /tmp writable from an emptyDir', () => {
    const pod = onlyOne('Deployment').spec.template.spec;
    const mount = theContainer().volumeMounts?.find(({ mountPath }) => mountPath === '/tmp');
    expect(mount?.readOnly ?? false).toBe(false);
    expect(pod.volumes?.find(({ name }) => name === mount?.name)?.emptyDir).toBeDefined();
  });

  it('requests are within limits, and the memory at which the service sheds load is under the limit', () => {
    const container = theContainer();
    const { requests, limits } = container.resources;
    expect(requests).toEqual({ cpu: 0.5, memory: 256 * 2 ** 20 });
    expect(limits).toEqual({ cpu: 1, memory: 512 * 2 ** 20 });
    expect(requests.cpu).toBeLessThanOrEqual(limits.cpu);
    expect(requests.memory).toBeLessThanOrEqual(limits.memory);
    const maxRssBytes = Number(environmentValue(container, 'MAX_RSS_BYTES'));
    expect(maxRssBytes).toBeGreaterThanOrEqual(requests.memory);
    expect(maxRssBytes).toBeLessThan(limits.memory);
    expect(Number(environmentValue(container, 'ANSWER_CACHE_BYTES') ?? 33554432)).toBeLessThan(maxRssBytes);
    expect(environmentValue(container, 'MAX_HEAP_USED_BYTES')).toMatch(/^\d+$/);
  });

  it('the image tag is the package version', () => {
    expect(theContainer().image).toBe(`memberproof:${packageVersion}`);
  });

  it('the scrape annotations point at /metrics on the container port', () => {
    const annotations = onlyOne('Deployment').spec.template.metadata.annotations ?? {};
    expect(annotations['prometheus.io/path']).toBe('/metrics');
    expect(Number(annotations['prometheus.io/port'])).toBe(theContainer().ports[0]?.containerPort);
  });
});

describe('Dockerfile', () => {
  it('runs the production dependencies only, as the node user, health-checked on /healthz', () => {
    expect(runtimeStage()[0]?.arguments).toMatch(/^node:22\.\d+\.\d+-bookworm-slim\b/);
    expect(argumentsOf('RUN').some((command) => /\bnpm ci --omit=dev\b/.test(command))).toBe(true);
    expect(argumentsOf('USER').at(-1)).toBe('node');
    expect(argumentsOf('HEALTHCHECK')).toHaveLength(1);
    expect(dockerfileHealthScript()).toContain('/healthz');
  });

  it('builds and runs on one pinned Node 22 LTS release that package.json\'s engines admit', () => {
    const images = dockerfileStages(readText('Dockerfile')).map((stage) => stage[0]?.arguments.split(/\s+/)[0]);
    expect(new Set(images).size).toBe(1);
    const [, minor = '', patch = ''] = /^node:22\.(\d+)\.(\d+)-bookworm-slim$/.exec(images[0] ?? '') ?? [];
    expect(patch).not.toBe('');
    const engines = z.object({ engines: z.object({ node: z.string() }) }).parse(JSON.parse(readText('package.json'))).engines.node;
    // "^20.19.0 || >=22.12.0": the image's 22.x must be at or past 22.12 (require of ES modules, which some dependencies need).
    expect(engines).toBe('^20.19.0 || >=22.12.0');
    expect(Number(minor)).toBeGreaterThanOrEqual(12);
  });

  it('exposes the container port of the Deployment', () => {
    expect(argumentsOf('EXPOSE')).toEqual([String(theContainer().ports[0]?.containerPort)]);
  });
});

describe('docker/compose.yaml', () => {
  const service = () => {
    const services = Object.values(composeFile().services);
    expect(services).toHaveLength(1);
    return services[0] as NonNullable<(typeof services)[number]>;
  };

  it('runs the image of this version, publishing the exposed port', () => {
    expect(service().image).toBe(`memberproof:${packageVersion}`);
    expect(service().ports.map((mapping) => mapping.split(':').at(-1))).toEqual(argumentsOf('EXPOSE'));
    expect(service().environment.HOST).toBe('0.0.0.0');
  });

  it('sets only environment variables the service reads', () => {
    expect(Object.keys(service().environment).filter((name) => !serviceReads(name))).toEqual([]);
  });

  it('checks health with the Dockerfile HEALTHCHECK command', () => {
    expect(service().healthcheck.test).toEqual(['CMD', 'node', '-e', dockerfileHealthScript()]);
  });

  it('keeps the root filesystem read-only with a tmpfs on /tmp', () => {
    expect(service().read_only).toBe(true);
    expect(service().tmpfs).toContain('/tmp');
  });

  it('gives the shutdown more time than the service grace before SIGKILL', () => {
    expect(service().stop_grace_period).toBe(40);
    expect(service().stop_grace_period).toBeGreaterThan(shutdownGraceSeconds());
  });
});
