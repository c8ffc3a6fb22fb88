/**
 * Schemas of the fields the deployment files use, and readers for those files: the Kubernetes
 * manifests in deploy/kubernetes, docker/compose.yaml and the Dockerfile. The objects are strict, so a
 * misspelt or unreviewed field fails here instead of being ignored; a new field goes into its schema.
 */

import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseAllDocuments, type DocumentOptions, type ParseOptions, type SchemaOptions } from 'yaml';
import { z } from 'zod';

export const repositoryRoot = fileURLToPath(new URL('../..', import.meta.url));
export const kubernetesFolder = join(repositoryRoot, 'deploy', 'kubernetes');

// Quantities: https://kubernetes.io/docs/reference/kubernetes-api/common-definitions/quantity/
const BINARY_SUFFIXES: Record<string, number> = { Ki: 2 ** 10, Mi: 2 ** 20, Gi: 2 ** 30, Ti: 2 ** 40 };
const DECIMAL_SUFFIXES: Record<string, number> = { '': 1, k: 1e3, M: 1e6, G: 1e9, T: 1e12 };

/** A CPU quantity ("500m", "1", 2) in cores. */
export const cpuQuantity = z.union([
  z.number().positive(),
  z
    .string()
    .regex(/^\d+(\.\d+)?m?$/, 'a CPU quantity such as "500m" or "1"')
    .transform((text) => (text.endsWith('m') ? Number(text.slice(0, -1)) / 1000 : Number(text))),
]);

/** A memory quantity ("256Mi", "1G", 1048576) in bytes. */
export const memoryQuantity = z.union([
  z.number().int().positive(),
  z
    .string()
    .regex(/^\d+(\.\d+)?(Ki|Mi|Gi|Ti|k|M|G|T)?$/, 'a memory quantity such as "256Mi"')
    .transform((text) => {
      const [, digits = '', suffix = ''] = /^([\d.]+)(\D*)$/.exec(text) ?? [];
      return Number(digits) * (BINARY_SUFFIXES[suffix] ?? DECIMAL_SUFFIXES[suffix] ?? Number.NaN);
    }),
]);

/** A compose duration ("40s", "1m30s", "500ms") in seconds. */
export const composeDuration = z
  .string()
  .regex(/^(\d+(\.\d+)?(h|m|s|ms|us))+$/, 'a duration such as "40s"')
  .transform((text) => {
    const seconds: Record<string, number> = { h: 3600, m: 60, s: 1, ms: 1e-3, us: 1e-6 };
    return [...text.matchAll(/(\d+(?:\.\d+)?)(ms|us|h|m|s)/g)].reduce((sum, [, value, unit]) => sum + Number(value) * (seconds[unit ?? ''] ?? Number.NaN), 0);
  });

const name = z.string().regex(/^[a-z0-9]([-a-z0-9]*[a-z0-9])?$/, 'a DNS label');
// An IANA service name: at most 15 characters, lower case, at least one letter.
const portName = z.string().regex(/^(?=.*[a-z])[a-z0-9]([-a-z0-9]{0,13}[a-z0-9])?$/, 'a port name');
const portNumber = z.number().int().min(1).max(65535);
/** A port given by number or by the name of a container port. */
const portReference = z.union([portNumber, portName]);
const labels = z.record(z.string(), z.string());
const labelSelector = z.strictObject({ matchLabels: labels });
const metadata = z.strictObject({ name, labels: labels.optional(), annotations: labels.optional() });
const seconds = z.number().int().nonnegative();

const httpGetProbe = z.strictObject({
  httpGet: z.strictObject({ path: z.string().startsWith('/'), port: portReference }),
  initialDelaySeconds: seconds.optional(),
  periodSeconds: seconds.positive().optional(),
  timeoutSeconds: seconds.positive().optional(),
  failureThreshold: seconds.positive().optional(),
  successThreshold: seconds.positive().optional(),
});

const seccompProfile = z.strictObject({ type: z.enum(['RuntimeDefault', 'Localhost', 'Unconfined']) });

const containerSecurityContext = z.strictObject({
  runAsNonRoot: z.boolean().optional(),
  runAsUser: z.number().int().nonnegative().optional(),
  runAsGroup: z.number().int().nonnegative().optional(),
  readOnlyRootFilesystem: z.boolean().optional(),
  allowPrivilegeEscalation: z.boolean().optional(),
  capabilities: z.strictObject({ drop: z.array(z.string()).optional(), add: z.array(z.string()).optional() }).optional(),
  seccompProfile: seccompProfile.optional(),
});

const podSecurityContext = z.strictObject({
  runAsNonRoot: z.boolean().optional(),
  runAsUser: z.number().int().nonnegative().optional(),
  runAsGroup: z.number().int().nonnegative().optional(),
  fsGroup: z.number().int().nonnegative().optional(),
  seccompProfile: seccompProfile.optional(),
});

const resourceAmounts = z.strictObject({ cpu: cpuQuantity, memory: memoryQuantity });

const container = z.strictObject({
  name,
  image: z.string().min(1),
  imagePullPolicy: z.enum(['Always', 'IfNotPresent', 'Never']).optional(),
  ports: z.array(z.strictObject({ name: portName, containerPort: portNumber, protocol: z.enum(['TCP', 'UDP', 'SCTP']).optional() })).min(1),
  // Kubernetes refuses an env value that is not a string: "3000" must be quoted.
  env: z.array(z.strictObject({ name: z.string().regex(/^[A-Za-z_][A-Za-z0-9_]*$/), value: z.string() })).optional(),
  resources: z.strictObject({ requests: resourceAmounts, limits: resourceAmounts }),
  securityContext: containerSecurityContext,
  startupProbe: httpGetProbe.optional(),
  readinessProbe: httpGetProbe,
  livenessProbe: httpGetProbe,
  lifecycle: z.strictObject({ preStop: z.strictObject({ exec: z.strictObject({ command: z.array(z.string()).min(1) }) }) }).optional(),
  volumeMounts: z.array(z.strictObject({ name, mountPath: z.string().startsWith('/'), readOnly: z.boolean().optional() })).optional(),
});

export const deploymentSchema = z.strictObject({
  apiVersion: z.literal('apps/v1'),
  kind: z.literal('Deployment'),
  metadata,
  spec: z.strictObject({
    replicas: z.number().int().positive(),
    revisionHistoryLimit: z.number().int().nonnegative().optional(),
    selector: labelSelector,
    strategy: z
      .strictObject({
        type: z.literal('RollingUpdate'),
        rollingUpdate: z.strictObject({ maxSurge: z.union([z.number().int(), z.string()]), maxUnavailable: z.union([z.number().int(), z.string()]) }),
      })
      .optional(),
    template: z.strictObject({
      metadata: z.strictObject({ labels, annotations: labels.optional() }),
      spec: z.strictObject({
        automountServiceAccountToken: z.boolean().optional(),
        terminationGracePeriodSeconds: seconds,
        securityContext: podSecurityContext.optional(),
        topologySpreadConstraints: z
          .array(
            z.strictObject({
              maxSkew: z.number().int().positive(),
              topologyKey: z.string(),
              whenUnsatisfiable: z.enum(['DoNotSchedule', 'ScheduleAnyway']),
              labelSelector,
            }),
          )
          .optional(),
        containers: z.array(container).min(1),
        volumes: z.array(z.strictObject({ name, emptyDir: z.strictObject({ medium: z.literal('Memory').optional(), sizeLimit: memoryQuantity.optional() }) })).optional(),
      }),
    }),
  }),
});

export const serviceSchema = z.strictObject({
  apiVersion: z.literal('v1'),
  kind: z.literal('Service'),
  metadata,
  spec: z.strictObject({
    type: z.literal('ClusterIP'),
    selector: labels,
    ports: z.array(z.strictObject({ name: portName.optional(), port: portNumber, targetPort: portReference, protocol: z.literal('TCP').optional() })).min(1),
  }),
});

export const horizontalPodAutoscalerSchema = z.strictObject({
  apiVersion: z.literal('autoscaling/v2'),
  kind: z.literal('HorizontalPodAutoscaler'),
  metadata,
  spec: z.strictObject({
    scaleTargetRef: z.strictObject({ apiVersion: z.string(), kind: z.string(), name }),
    minReplicas: z.number().int().positive(),
    maxReplicas: z.number().int().positive(),
    metrics: z
      .array(
        z.strictObject({
          type: z.literal('Resource'),
          resource: z.strictObject({
            name: z.enum(['cpu', 'memory']),
            target: z.strictObject({ type: z.literal('Utilization'), averageUtilization: z.number().int().min(1) }),
          }),
        }),
      )
      .min(1),
  }),
});

export const podDisruptionBudgetSchema = z.strictObject({
  apiVersion: z.literal('policy/v1'),
  kind: z.literal('PodDisruptionBudget'),
  metadata,
  spec: z.strictObject({ minAvailable: z.number().int().nonnegative(), selector: labelSelector }),
});

export const kustomizationSchema = z.strictObject({
  apiVersion: z.literal('kustomize.config.k8s.io/v1beta1'),
  kind: z.literal('Kustomization'),
  namespace: name.optional(),
  resources: z.array(z.string()).min(1),
});

export const kubernetesManifestSchema = z.discriminatedUnion('kind', [
  deploymentSchema,
  serviceSchema,
  horizontalPodAutoscalerSchema,
  podDisruptionBudgetSchema,
  kustomizationSchema,
]);

export type Deployment = z.infer<typeof deploymentSchema>;
export type Container = Deployment['spec']['template']['spec']['containers'][number];
export type KubernetesManifest = z.infer<typeof kubernetesManifestSchema>;

export const composeSchema = z.strictObject({
  services: z.record(
    z.string(),
    z.strictObject({
      build: z.strictObject({ context: z.string(), dockerfile: z.string() }),
      image: z.string(),
      ports: z.array(z.string().regex(/^(\d+:)?\d+$/, 'a "host:container" port mapping')),
      environment: z.record(z.string(), z.string()),
      volumes: z.array(z.string()).optional(),
      read_only: z.boolean(),
      tmpfs: z.array(z.string()),
      healthcheck: z.strictObject({
        test: z.array(z.string()).min(2),
        interval: composeDuration,
        timeout: composeDuration,
        start_period: composeDuration,
        retries: z.number().int().positive(),
      }),
      stop_grace_period: composeDuration,
      restart: z.enum(['no', 'always', 'on-failure', 'unless-stopped']),
    }),
  ),
});

export type Compose = z.infer<typeof composeSchema>;

/** Every document of a YAML file, as plain data; a syntax error, a warning or a duplicate key throws. */
export function yamlDocuments(path: string, options: DocumentOptions & ParseOptions & SchemaOptions = {}): unknown[] {
  return parseAllDocuments(readFileSync(path, 'utf8'), { uniqueKeys: true, ...options }).map((document, index) => {
    const trouble = [...document.errors, ...document.warnings];
    if (trouble.length > 0) throw new Error(`${path}, document ${index + 1}: ${trouble.map((error) => error.message).join('; ')}`);
    return document.toJS();
  });
}

function parsedOrThrow<T>(schema: z.ZodType<T>, data: unknown, where: string): T {
  const result = schema.safeParse(data);
  if (!result.success) throw new Error(`${where} does not match its schema:\n${z.prettifyError(result.error)}`);
  return result.data;
}

export interface ManifestFile {
  readonly file: string;
  readonly manifest: KubernetesManifest;
}

/** Every YAML document in deploy/kubernetes, checked against the schema of its kind. */
export function kubernetesManifests(): ManifestFile[] {
  const files = readdirSync(kubernetesFolder)
    .filter((file) => /\.ya?ml$/.test(file))
    .sort();
  // Kubernetes reads YAML 1.1 (sigs.k8s.io/yaml): an unquoted yes or on is a boolean there, so here too.
  return files.flatMap((file) =>
    yamlDocuments(join(kubernetesFolder, file), { version: '1.1' }).map((data) => ({ file, manifest: parsedOrThrow(kubernetesManifestSchema, data, `deploy/kubernetes/${file}`) })),
  );
}

/** docker/compose.yaml, checked against its schema. */
export function composeFile(): Compose {
  const documents = yamlDocuments(join(repositoryRoot, 'docker', 'compose.yaml'));
  if (documents.length !== 1) throw new Error(`docker/compose.yaml holds ${documents.length} documents, not 1`);
  return parsedOrThrow(composeSchema, documents[0], 'docker/compose.yaml');
}

export interface DockerfileInstruction {
  readonly keyword: string;
  readonly arguments: string;
}

/** The Dockerfile's instructions, stage by stage (each stage starts with its FROM); continuation lines joined. */
export function dockerfileStages(text: string): DockerfileInstruction[][] {
  const lines = text
    .split('\n')
    .filter((line) => !/^\s*#/.test(line))
    .join('\n')
    .replace(/\s*\\\n\s*/g, ' ')
    .split('\n')
    .map((line) => line.trim())
    .filter(Boolean);
  const stages: DockerfileInstruction[][] = [];
  for (const line of lines) {
    const [, keyword = '', rest = ''] = /^(\S+)\s*(.*)$/.exec(line) ?? [];
    const instruction = { keyword: keyword.toUpperCase(), arguments: rest };
    if (instruction.keyword === 'FROM') stages.push([instruction]);
    else stages.at(-1)?.push(instruction);
  }
  return stages;
}

export function readText(...pathFromRoot: string[]): string {
  return readFileSync(join(repositoryRoot, ...pathFromRoot), 'utf8');
}
