"""Structure checks of the files under deploy/ (run by deploy/check).

Parses every YAML and JSON file, then checks what a schema alone would not: that the Kubernetes
objects point at each other correctly (probes, ports, selectors, volumes, ConfigMaps), that the
compose file's services, paths and brokers fit together, that the rules and the dashboard use only
metric names the service exposes, and that the topic jobs create the four topics safely.
Prints one line per problem and exits with 1 when there is any.

Usage: python3 deploy/check_structure.py [DEPLOY_DIR]
       python3 deploy/check_structure.py DEPLOY_DIR --dashboard-queries-as-rules FILE
"""

import json
import re
import sys
from pathlib import Path

import yaml

# The metric names qfleet exposes (the contract with the service's metrics code). Anything else
# in the rules or the dashboard must start with one of ALLOWED_PREFIXES, be in ALLOWED_OTHER, or
# be a series recorded by the rules file.
QFLEET_METRICS = {
    "qfleet_sweeps_processed_total",
    "qfleet_fit_duration_seconds_bucket",
    "qfleet_fit_duration_seconds_count",
    "qfleet_fit_duration_seconds_sum",
    "qfleet_unloaded_q_bucket",
    "qfleet_unloaded_q_count",
    "qfleet_unloaded_q_sum",
    "qfleet_rejects_total",
    "qfleet_lot_mean_unloaded_q",
    "qfleet_lot_units",
    "qfleet_lot_lower_limit_unloaded_q",
    "qfleet_lot_series_dropped_total",
    "qfleet_station_qu_ewma",
    "qfleet_station_qu_ewma_limit",
    "qfleet_station_cusum",
    "qfleet_station_cusum_limit",
    "qfleet_alerts_active",
    "qfleet_alerts_raised_total",
    "qfleet_ready",
}
ALLOWED_PREFIXES = ("jvm_", "kafka_")
ALLOWED_OTHER = {"up"}

TOPICS = {"qfleet.sweeps": 6, "qfleet.results": 6, "qfleet.rejects": 1, "qfleet.alerts": 1}
CATALOGUE_FIELDS = {"product", "qUnloadedMin", "f0MinHz", "f0MaxHz", "insertionLossMinDb", "insertionLossMaxDb"}
DEMO_PRODUCTS = {"cav-x104", "coax-s36"}
API_VERSIONS = {
    "Namespace": "v1",
    "ConfigMap": "v1",
    "Service": "v1",
    "Deployment": "apps/v1",
    "Job": "batch/v1",
    "PodDisruptionBudget": "policy/v1",
}
SEVERITIES = {"critical", "warning", "info"}
PROMQL_KEYWORDS = {"by", "without", "on", "ignoring", "group_left", "group_right", "bool", "and", "or",
                   "unless", "offset", "inf", "nan", "Inf", "NaN"}

problems = []


def problem(where, what):
    problems.append(f"{where}: {what}")


# ---------------------------------------------------------------- PromQL names


def metric_names(expr):
    """The metric (or recorded series) names a PromQL expression selects."""
    s = re.sub(r'"(?:[^"\\]|\\.)*"', '""', expr)
    s = re.sub(r"'(?:[^'\\]|\\.)*'", "''", s)
    s = re.sub(r"\{[^}]*\}", " ", s)
    s = re.sub(r"\[[^\]]*\]", " ", s)
    s = re.sub(r"\b(by|without|on|ignoring|group_left|group_right)\s*\([^)]*\)", " ", s)
    s = re.sub(r"\$\{?\w+\}?", " ", s)
    s = re.sub(r"(?<![A-Za-z0-9_:.])\d+(\.\d+)?([eE][+-]?\d+)?", " ", s)
    names = set()
    for m in re.finditer(r"[A-Za-z_:][A-Za-z0-9_:]*", s):
        token = m.group(0)
        if token in PROMQL_KEYWORDS or s[m.end():].lstrip().startswith("("):
            continue
        names.add(token)
    return names


def check_names(where, expr, recorded):
    for name in metric_names(expr):
        if name in QFLEET_METRICS or name in ALLOWED_OTHER or name in recorded or name.startswith(ALLOWED_PREFIXES):
            continue
        problem(where, f"unknown metric name '{name}' in: {expr.strip()}")


# ---------------------------------------------------------------- loading


def load_all(deploy):
    docs = {}
    for path in sorted(deploy.rglob("*")):
        if not path.is_file():
            continue
        rel = path.relative_to(deploy)
        try:
            if path.suffix in (".yml", ".yaml"):
                docs[rel] = [d for d in yaml.safe_load_all(path.read_text(encoding="utf-8")) if d is not None]
            elif path.suffix == ".json":
                docs[rel] = [json.loads(path.read_text(encoding="utf-8"))]
        except (yaml.YAMLError, json.JSONDecodeError, UnicodeDecodeError) as e:
            problem(rel, f"does not parse: {e}")
    return docs


# ---------------------------------------------------------------- Prometheus rules


def check_rules(rel, doc):
    recorded = set()
    groups = doc.get("groups") if isinstance(doc, dict) else None
    if not isinstance(groups, list) or not groups:
        problem(rel, "no rule groups")
        return recorded
    for group in groups:
        for rule in group.get("rules", []):
            if "record" in rule:
                recorded.add(rule["record"])
    alerts = 0
    lag_metric_uses = 0
    for group in groups:
        for rule in group.get("rules", []):
            name = rule.get("alert") or rule.get("record")
            where = f"{rel}: rule {name}"
            expr = str(rule.get("expr", ""))
            lag_metric_uses += sum(1 for n in metric_names(expr) if n.startswith("kafka_"))
            check_names(where, expr, recorded)
            if "alert" in rule:
                alerts += 1
                if rule.get("labels", {}).get("severity") not in SEVERITIES:
                    problem(where, f"severity label must be one of {sorted(SEVERITIES)}")
                for key in ("summary", "description"):
                    if not str(rule.get("annotations", {}).get(key, "")).strip():
                        problem(where, f"annotation '{key}' is missing")
    if alerts == 0:
        problem(rel, "no alerting rules")
    if lag_metric_uses != 1:
        problem(rel, f"Kafka client metrics should be named in exactly one rule (the recording rule), found {lag_metric_uses}")
    return recorded


# ---------------------------------------------------------------- dashboard


def check_dashboard(rel, dash, recorded):
    if not isinstance(dash.get("schemaVersion"), int) or dash["schemaVersion"] < 36:
        problem(rel, "schemaVersion missing or older than 36")
    variables = {v.get("name"): v for v in dash.get("templating", {}).get("list", [])}
    for name, var in variables.items():
        if var.get("type") == "query":
            query = var.get("query", "")
            query = query.get("query", "") if isinstance(query, dict) else query
            m = re.fullmatch(r"\s*label_values\((.*),\s*(\w+)\s*\)\s*", query)
            if not m:
                problem(rel, f"variable {name}: expected a label_values(metric, label) query, got '{query}'")
            else:
                check_names(f"{rel}: variable {name}", m.group(1), recorded)
    ids = set()
    exprs = 0
    for panel in dash.get("panels", []):
        title = panel.get("title", "?")
        where = f"{rel}: panel '{title}'"
        if panel.get("id") in ids:
            problem(where, f"duplicate panel id {panel.get('id')}")
        ids.add(panel.get("id"))
        grid = panel.get("gridPos", {})
        if not all(k in grid for k in ("x", "y", "w", "h")) or grid.get("x", 0) + grid.get("w", 0) > 24:
            problem(where, "gridPos missing or wider than the 24-column grid")
        if panel.get("type") == "row":
            continue
        targets = panel.get("targets") or []
        if not targets:
            problem(where, "has no queries")
        for t in targets:
            expr = t.get("expr", "")
            if not expr.strip():
                problem(where, f"query {t.get('refId')} has no expression")
                continue
            exprs += 1
            check_names(where, expr, recorded)
            for var in re.findall(r"\$(\w+)", expr):
                if not var.startswith("__") and var not in variables:
                    problem(where, f"uses ${var}, which is not a dashboard variable")
            ds = t.get("datasource") or panel.get("datasource") or {}
            if ds.get("uid") != "${datasource}":
                problem(where, "queries should use the ${datasource} variable")
    if exprs == 0:
        problem(rel, "no panel queries")


# ---------------------------------------------------------------- Kubernetes


def labels_match(selector, labels, where, what):
    if not selector:
        problem(where, f"{what}: empty selector")
    elif any(labels.get(k) != v for k, v in selector.items()):
        problem(where, f"{what}: selector {selector} does not match the pod labels {labels}")


def check_topic_script(where, script):
    for topic, partitions in TOPICS.items():
        if topic not in script:
            problem(where, f"does not create {topic}")
    if not re.search(r"for spec in " + " ".join(f"{t}:{p}" for t, p in TOPICS.items()), script):
        problem(where, "expected the topics with their partitions: " + " ".join(f"{t}:{p}" for t, p in TOPICS.items()))
    for needle in ("--create", "--if-not-exists", "--replication-factor 3", "min.insync.replicas=2"):
        if needle not in script:
            problem(where, f"topic creation lacks '{needle}'")


def pinned(where, image):
    if ":" not in image.rsplit("/", 1)[-1] or image.endswith(":latest"):
        problem(where, f"image '{image}' should have a fixed tag")


def container_port_names(container):
    ports = {}
    for p in container.get("ports", []):
        ports[p.get("containerPort")] = p
        if p.get("name"):
            ports[p["name"]] = p
    return ports


def check_probe(where, container, probe_name, path):
    probe = container.get(probe_name)
    if probe is None:
        if probe_name != "startupProbe":
            problem(where, f"no {probe_name}")
        return
    get = probe.get("httpGet", {})
    if get.get("path") != path:
        problem(where, f"{probe_name} should GET {path}, not {get.get('path')}")
    if get.get("port") not in container_port_names(container):
        problem(where, f"{probe_name} port {get.get('port')} is not a port of the container")


def check_pod(where, pod, configmaps, is_service):
    spec = pod.get("spec", {})
    security = spec.get("securityContext", {})
    volumes = {v.get("name"): v for v in spec.get("volumes", [])}
    if spec.get("enableServiceLinks") is not False:
        problem(where, "set enableServiceLinks: false (injected QFLEET_* service variables would stop qfleet)")
    for v in volumes.values():
        if "configMap" in v and v["configMap"].get("name") not in configmaps:
            problem(where, f"volume {v['name']} names ConfigMap {v['configMap'].get('name')}, which is not defined")
    for c in spec.get("containers", []):
        cw = f"{where}: container {c.get('name')}"
        pinned(cw, c.get("image", ""))
        csec = c.get("securityContext", {})
        if not (security.get("runAsNonRoot") or csec.get("runAsNonRoot")):
            problem(cw, "runAsNonRoot is not set")
        if csec.get("allowPrivilegeEscalation") is not False:
            problem(cw, "allowPrivilegeEscalation should be false")
        res = c.get("resources", {})
        for kind in ("requests", "limits"):
            if not {"cpu", "memory"} <= set(res.get(kind, {})):
                problem(cw, f"resources.{kind} needs cpu and memory")
        mounts = {m.get("mountPath"): m for m in c.get("volumeMounts", [])}
        for m in mounts.values():
            if m.get("name") not in volumes:
                problem(cw, f"mounts volume {m.get('name')}, which is not defined")
        env = {e.get("name"): e for e in c.get("env", [])}
        for e in env.values():
            ref = e.get("valueFrom", {}).get("configMapKeyRef")
            if ref:
                data = configmaps.get(ref.get("name"))
                if data is None or ref.get("key") not in data:
                    problem(cw, f"env {e['name']} reads {ref.get('name')}/{ref.get('key')}, which is not defined")
        if is_service:
            check_service_container(cw, c, env, mounts, volumes, configmaps)


def check_service_container(cw, c, env, mounts, volumes, configmaps):
    check_probe(cw, c, "livenessProbe", "/health/live")
    check_probe(cw, c, "readinessProbe", "/health/ready")
    check_probe(cw, c, "startupProbe", "/health/live")
    address = env.get("QFLEET_HTTP_ADDRESS", {}).get("value", "")
    m = re.fullmatch(r"0\.0\.0\.0:(\d+)", address)
    if not m:
        problem(cw, f"QFLEET_HTTP_ADDRESS should bind 0.0.0.0:PORT inside the pod, got '{address}'")
    elif int(m.group(1)) not in container_port_names(c):
        problem(cw, f"QFLEET_HTTP_ADDRESS port {m.group(1)} is not a container port")
    if "QFLEET_BOOTSTRAP_SERVERS" not in env:
        problem(cw, "QFLEET_BOOTSTRAP_SERVERS is not set (without it qfleet starts its embedded broker)")
    data_dir = env.get("QFLEET_DATA_DIR", {}).get("value")
    mount = mounts.get(data_dir)
    if not data_dir or mount is None or mount.get("readOnly"):
        problem(cw, "QFLEET_DATA_DIR should name a writable mounted volume")
    products = env.get("QFLEET_PRODUCTS_FILE", {}).get("value", "")
    folder, _, file = products.rpartition("/")
    catalogue_mount = mounts.get(folder)
    if catalogue_mount is None:
        problem(cw, f"the catalogue {products or '(QFLEET_PRODUCTS_FILE unset)'} is not on a mounted volume")
    else:
        cm = volumes.get(catalogue_mount.get("name"), {}).get("configMap", {}).get("name")
        if file not in configmaps.get(cm, {}):
            problem(cw, f"ConfigMap {cm} has no key {file} for the catalogue")


def check_catalogue(where, text):
    try:
        catalogue = json.loads(text)
    except json.JSONDecodeError as e:
        problem(where, f"products.json does not parse: {e}")
        return
    products = catalogue.get("products") if isinstance(catalogue, dict) else None
    if not isinstance(products, list) or not products:
        problem(where, "products.json needs a non-empty \"products\" array")
        return
    for i, p in enumerate(products):
        unknown = set(p) - CATALOGUE_FIELDS
        if unknown:
            problem(where, f"products[{i}] has unknown fields {sorted(unknown)}")
        if not isinstance(p.get("product"), str):
            problem(where, f"products[{i}] has no product id")
        for key in CATALOGUE_FIELDS - {"product"}:
            if key in p and not isinstance(p[key], (int, float)):
                problem(where, f"products[{i}].{key} is not a number")
    if {p.get("product") for p in products} != DEMO_PRODUCTS:
        problem(where, f"expected the demo plant's products {sorted(DEMO_PRODUCTS)}")


def check_kubernetes(deploy, docs):
    kdir = Path("kubernetes")
    objects = []
    kustomization = None
    for rel, items in docs.items():
        if rel.parent != kdir:
            continue
        if rel.name == "kustomization.yaml":
            kustomization = items[0] if items else {}
            continue
        for d in items:
            name = d.get("metadata", {}).get("name") if isinstance(d, dict) else None
            if not (isinstance(d, dict) and d.get("apiVersion") and d.get("kind") and name):
                problem(rel, "a document lacks apiVersion, kind or metadata.name")
                continue
            expected = API_VERSIONS.get(d["kind"])
            if expected is None:
                problem(rel, f"{d['kind']} {name}: a kind this check does not know")
            elif d["apiVersion"] != expected:
                problem(rel, f"{d['kind']} {name}: apiVersion should be {expected}")
            objects.append((rel, d))
    if kustomization is None:
        problem(kdir, "no kustomization.yaml")
        return
    listed = kustomization.get("resources", [])
    for r in listed:
        if not (deploy / kdir / r).is_file():
            problem(kdir / "kustomization.yaml", f"lists {r}, which does not exist")
    for rel in {rel for rel, _ in objects}:
        if rel.name not in listed:
            problem(kdir / "kustomization.yaml", f"does not list {rel.name}")
    configmaps = {d["metadata"]["name"]: d.get("data", {}) for _, d in objects if d["kind"] == "ConfigMap"}
    kinds = {}
    for rel, d in objects:
        kinds.setdefault(d["kind"], []).append((rel, d))
    for kind in ("Deployment", "Service", "PodDisruptionBudget", "Job", "ConfigMap"):
        if kind not in kinds:
            problem(kdir, f"no {kind}")
    for rel, d in kinds.get("ConfigMap", []):
        if "products.json" in d.get("data", {}):
            check_catalogue(f"{rel}: ConfigMap {d['metadata']['name']}", d["data"]["products.json"])
    deployments = kinds.get("Deployment", [])
    for rel, d in deployments:
        where = f"{rel}: Deployment {d['metadata']['name']}"
        template = d.get("spec", {}).get("template", {})
        labels_match(d.get("spec", {}).get("selector", {}).get("matchLabels"),
                     template.get("metadata", {}).get("labels", {}), where, "selector")
        check_pod(where, template, configmaps, is_service=True)
    for rel, d in kinds.get("Job", []):
        where = f"{rel}: Job {d['metadata']['name']}"
        pod = d.get("spec", {}).get("template", {})
        check_pod(where, pod, configmaps, is_service=False)
        for c in pod.get("spec", {}).get("containers", []):
            check_topic_script(where, " ".join(c.get("command", []) + c.get("args", [])))
    if not deployments:
        return
    pod_labels = deployments[0][1]["spec"]["template"]["metadata"]["labels"]
    containers = deployments[0][1]["spec"]["template"]["spec"]["containers"]
    ports = {}
    for c in containers:
        ports.update(container_port_names(c))
    for rel, d in kinds.get("Service", []):
        where = f"{rel}: Service {d['metadata']['name']}"
        labels_match(d.get("spec", {}).get("selector"), pod_labels, where, "selector")
        for p in d.get("spec", {}).get("ports", []):
            if p.get("targetPort", p.get("port")) not in ports:
                problem(where, f"targetPort {p.get('targetPort')} is not a port of the pods")
        notes = d.get("metadata", {}).get("annotations", {})
        if notes.get("prometheus.io/scrape") != "true":
            problem(where, "lacks the prometheus.io/scrape annotation")
        elif int(notes.get("prometheus.io/port", 0)) not in [p.get("port") for p in d["spec"].get("ports", [])]:
            problem(where, "prometheus.io/port is not a port of the Service")
    for rel, d in kinds.get("PodDisruptionBudget", []):
        labels_match(d.get("spec", {}).get("selector", {}).get("matchLabels"), pod_labels,
                     f"{rel}: PodDisruptionBudget {d['metadata']['name']}", "selector")


# ---------------------------------------------------------------- compose


def check_compose(deploy, docs):
    rel = Path("compose/compose.yaml")
    if rel not in docs:
        problem(rel, "missing")
        return
    compose = docs[rel][0]
    base = deploy / rel.parent
    services = compose.get("services", {})
    for name in ("kafka-1", "kafka-2", "kafka-3", "kafka-init", "qfleet", "prometheus", "grafana"):
        if name not in services:
            problem(rel, f"no service {name}")
    volumes = set(compose.get("volumes") or {})
    node_ids = {}
    for name, svc in services.items():
        where = f"{rel}: service {name}"
        if "image" in svc:
            pinned(where, svc["image"])
        deps = svc.get("depends_on", [])
        for dep in deps if isinstance(deps, list) else deps.keys():
            if dep not in services:
                problem(where, f"depends on {dep}, which is not a service")
        for v in svc.get("volumes", []):
            source = v.split(":", 1)[0]
            if source.startswith((".", "/")):
                if not (base / source).exists():
                    problem(where, f"mounts {source}, which does not exist")
            elif source not in volumes:
                problem(where, f"named volume {source} is not declared")
        build = svc.get("build")
        if build:
            context = base / build.get("context", ".")
            if not (context / build.get("dockerfile", "Dockerfile")).is_file():
                problem(where, "the Dockerfile is not where build names it")
        env = svc.get("environment", {})
        if name.startswith("kafka-") and "KAFKA_NODE_ID" in env:
            node_ids[str(env["KAFKA_NODE_ID"])] = name
            if f"//{name}:" not in env.get("KAFKA_ADVERTISED_LISTENERS", ""):
                problem(where, "does not advertise its own host name")
    if len(node_ids) != 3:
        problem(rel, f"expected three brokers with distinct node ids, got {sorted(node_ids)}")
    voters = services.get("kafka-1", {}).get("environment", {}).get("KAFKA_CONTROLLER_QUORUM_VOTERS", "")
    expected_voters = ",".join(f"{i}@{node_ids[i]}:9093" for i in sorted(node_ids))
    if voters != expected_voters:
        problem(rel, f"controller quorum voters '{voters}' do not match the brokers ({expected_voters})")
    init = services.get("kafka-init", {})
    check_topic_script(f"{rel}: service kafka-init", " ".join(init.get("command", [])))
    qfleet = services.get("qfleet", {})
    env = qfleet.get("environment", {})
    m = re.fullmatch(r"0\.0\.0\.0:(\d+)", str(env.get("QFLEET_HTTP_ADDRESS", "")))
    if not m:
        problem(f"{rel}: service qfleet", "QFLEET_HTTP_ADDRESS should bind 0.0.0.0:PORT inside the container")
    elif not any(str(p).endswith(f":{m.group(1)}") for p in qfleet.get("ports", [])):
        problem(f"{rel}: service qfleet", "the metrics port is not published")
    brokers = [b.split(":")[0] for b in str(env.get("QFLEET_BOOTSTRAP_SERVERS", "")).split(",")]
    if sorted(brokers) != sorted(n for n in services if n.startswith("kafka-") and n != "kafka-init"):
        problem(f"{rel}: service qfleet", f"QFLEET_BOOTSTRAP_SERVERS should list the three brokers, got {brokers}")
    prometheus = docs.get(Path("prometheus/prometheus.yml"), [{}])[0]
    targets = [t for job in prometheus.get("scrape_configs", []) if job.get("job_name") == "qfleet"
               for sc in job.get("static_configs", []) for t in sc.get("targets", [])]
    if m and f"qfleet:{m.group(1)}" not in targets:
        problem("prometheus/prometheus.yml", f"job qfleet should scrape qfleet:{m.group(1)}, has {targets}")


def check_grafana_provisioning(docs):
    ds = docs.get(Path("grafana/provisioning/datasources/qfleet-prometheus.yaml"), [{}])[0]
    if not any(d.get("type") == "prometheus" and d.get("url") == "http://prometheus:9090"
               for d in ds.get("datasources", [])):
        problem("grafana/provisioning/datasources", "no Prometheus datasource at http://prometheus:9090")
    providers = docs.get(Path("grafana/provisioning/dashboards/qfleet.yaml"), [{}])[0].get("providers", [])
    compose = docs.get(Path("compose/compose.yaml"), [{}])[0]
    mounts = compose.get("services", {}).get("grafana", {}).get("volumes", [])
    for p in providers:
        path = p.get("options", {}).get("path", "")
        if not any(v.split(":")[0].endswith("qfleet-dashboard.json") and v.split(":")[1].startswith(path + "/")
                   for v in mounts):
            problem("grafana/provisioning/dashboards", f"provider path {path} does not hold the mounted dashboard")


def dashboard_queries_as_rules(docs, out):
    """Writes every dashboard query, with the Grafana variables replaced by sample values, as
    recording rules, so that promtool can check their PromQL syntax."""
    values = {"__rate_interval": "1m", "__interval": "1m", "__range": "1h"}
    rules = []
    for rel in sorted(docs):
        if rel.parent != Path("grafana") or rel.suffix != ".json":
            continue
        for panel in docs[rel][0].get("panels", []):
            for t in panel.get("targets") or []:
                expr = re.sub(r"\$\{?(\w+)\}?", lambda m: values.get(m.group(1), ".*"), t.get("expr", ""))
                rules.append({"record": f"dashboard:panel_{panel.get('id')}:{t.get('refId')}", "expr": expr})
    Path(out).write_text(yaml.safe_dump({"groups": [{"name": "dashboard-queries", "rules": rules}]}), encoding="utf-8")


def main():
    if len(sys.argv) == 4 and sys.argv[2] == "--dashboard-queries-as-rules":
        deploy = Path(sys.argv[1])
        dashboard_queries_as_rules(load_all(deploy), sys.argv[3])
        return 0
    deploy = Path(sys.argv[1] if len(sys.argv) > 1 else Path(__file__).resolve().parent)
    docs = load_all(deploy)
    rules = docs.get(Path("prometheus/qfleet-rules.yml"))
    recorded = check_rules("prometheus/qfleet-rules.yml", rules[0]) if rules else set()
    if not rules:
        problem("prometheus/qfleet-rules.yml", "missing")
    dashboards = [rel for rel in docs if rel.parent == Path("grafana") and rel.suffix == ".json"]
    if not dashboards:
        problem("grafana", "no dashboard JSON")
    for rel in dashboards:
        check_dashboard(rel, docs[rel][0], recorded)
    check_kubernetes(deploy, docs)
    check_compose(deploy, docs)
    check_grafana_provisioning(docs)
    for p in problems:
        print(f"deploy/{p}")
    print(f"structure: {len(docs)} YAML/JSON files parsed, {len(problems)} problem(s)")
    return 1 if problems else 0


if __name__ == "__main__":
    sys.exit(main())
