//! The import rule of the crate, checked on the source tree (no build needed to read it).
//!
//! Read [`RULE`] first: it is the whole rule, and a failure prints it with every reference
//! that breaks it (file:line).

/// The rule a newcomer reads. Everything below only enforces it.
const RULE: &str = "\
Layers, highest first: main > ops > api > trajectory > physics.
 1. A layer refers only to itself and to the layers below it (`crate::x::` paths anywhere in
    code, `use` lines and groups, `super::` climbing out of a layer, and re-exports at the
    crate root all count). main is src/main.rs; ops is src/ops/; api is src/api/; trajectory
    is src/trajectory/; physics is src/physics/.
 2. physics uses nothing but itself and std/core/alloc: no external crate at all.
    trajectory uses physics and, of the external crates, only serde and serde_json.
 3. No import circles between sibling modules: for two modules with a common parent, take
    A' and B', the children of their lowest common ancestor on the way to each; references
    A' -> ... -> B' and B' -> ... -> A' must not both exist (parent <-> child references
    such as `super::X` are fine).
Service values reach a lower layer as plain values at construction (api::Limits, the
leap-second table handle, the OpenAPI document), never by importing the layer above.";

use std::collections::{BTreeMap, BTreeSet};
use std::fs;
use std::path::{Path, PathBuf};

/// The layers, lowest first.
const LAYERS: [&str; 5] = ["physics", "trajectory", "api", "ops", "main"];

/// External crates each layer may use (`None`: any dependency).
fn allowed_external(layer: &str) -> Option<&'static [&'static str]> {
    match layer {
        "physics" => Some(&[]),
        "trajectory" => Some(&["serde", "serde_json"]),
        _ => None,
    }
}

fn rank(layer: &str) -> Option<usize> {
    LAYERS.iter().position(|l| *l == layer)
}

/// One offending reference.
#[derive(Debug, Clone, PartialEq, Eq, PartialOrd, Ord)]
struct Finding {
    file: String,
    line: usize,
    message: String,
}

/// A token of Rust source with its line.
#[derive(Debug, Clone)]
struct Token {
    text: String,
    line: usize,
}

/// The source with comments, string literals and char literals blanked out (newlines kept, so
/// lines still count).
fn strip(source: &str) -> String {
    let chars: Vec<char> = source.chars().collect();
    let mut out = String::with_capacity(source.len());
    let mut i = 0;
    let blank = |c: char| if c == '\n' { '\n' } else { ' ' };
    while i < chars.len() {
        let c = chars[i];
        let next = chars.get(i + 1).copied();
        if c == '/' && next == Some('/') {
            while i < chars.len() && chars[i] != '\n' {
                out.push(' ');
                i += 1;
            }
        } else if c == '/' && next == Some('*') {
            let mut depth = 0usize;
            while i < chars.len() {
                if chars[i] == '/' && chars.get(i + 1) == Some(&'*') {
                    depth += 1;
                    out.push_str("  ");
                    i += 2;
                } else if chars[i] == '*' && chars.get(i + 1) == Some(&'/') {
                    depth -= 1;
                    out.push_str("  ");
                    i += 2;
                    if depth == 0 {
                        break;
                    }
                } else {
                    out.push(blank(chars[i]));
                    i += 1;
                }
            }
        } else if (c == 'r' || c == 'b')
            && !chars[..i]
                .last()
                .is_some_and(|p| p.is_alphanumeric() || *p == '_')
            && raw_string_start(&chars, i).is_some()
        {
            let (hashes, body_start) = raw_string_start(&chars, i).unwrap_or((0, i));
            for _ in i..body_start {
                out.push(' ');
            }
            i = body_start;
            let closing: String = std::iter::once('"')
                .chain(std::iter::repeat_n('#', hashes))
                .collect();
            let closing: Vec<char> = closing.chars().collect();
            while i < chars.len() && !chars[i..].starts_with(&closing) {
                out.push(blank(chars[i]));
                i += 1;
            }
            for _ in 0..closing.len().min(chars.len() - i) {
                out.push(' ');
            }
            i += closing.len();
        } else if c == '"' {
            out.push(' ');
            i += 1;
            while i < chars.len() && chars[i] != '"' {
                if chars[i] == '\\' {
                    out.push(' ');
                    i += 1;
                }
                if i < chars.len() {
                    out.push(blank(chars[i]));
                    i += 1;
                }
            }
            out.push(' ');
            i += 1;
        } else if c == '\'' {
            // A char literal ('x', '\n', '\u{..}') or a lifetime ('a).
            if next == Some('\\') {
                out.push(' ');
                i += 2;
                while i < chars.len() && chars[i] != '\'' {
                    out.push(' ');
                    i += 1;
                }
                out.push_str("  ");
                i += 1;
            } else if chars.get(i + 2) == Some(&'\'') {
                out.push_str("   ");
                i += 3;
            } else {
                out.push(c);
                i += 1;
            }
        } else {
            out.push(c);
            i += 1;
        }
    }
    out
}

/// At `r"`, `r#"`, `br"`...: the number of `#` and where the body starts.
fn raw_string_start(chars: &[char], at: usize) -> Option<(usize, usize)> {
    let mut i = at;
    if chars.get(i) == Some(&'b') {
        i += 1;
    }
    if chars.get(i) != Some(&'r') {
        return None;
    }
    i += 1;
    let mut hashes = 0;
    while chars.get(i) == Some(&'#') {
        hashes += 1;
        i += 1;
    }
    (chars.get(i) == Some(&'"')).then_some((hashes, i + 1))
}

fn tokens(stripped: &str) -> Vec<Token> {
    let mut out = Vec::new();
    for (index, line) in stripped.lines().enumerate() {
        let chars: Vec<char> = line.chars().collect();
        let mut i = 0;
        while i < chars.len() {
            let c = chars[i];
            if c.is_alphabetic() || c == '_' {
                let start = i;
                while i < chars.len() && (chars[i].is_alphanumeric() || chars[i] == '_') {
                    i += 1;
                }
                let mut text: String = chars[start..i].iter().collect();
                if text == "r" && chars.get(i) == Some(&'#') {
                    // A raw identifier r#name.
                    i += 1;
                    let begin = i;
                    while i < chars.len() && (chars[i].is_alphanumeric() || chars[i] == '_') {
                        i += 1;
                    }
                    text = chars[begin..i].iter().collect();
                }
                out.push(Token {
                    text,
                    line: index + 1,
                });
            } else if c == ':' && chars.get(i + 1) == Some(&':') {
                out.push(Token {
                    text: "::".into(),
                    line: index + 1,
                });
                i += 2;
            } else if c.is_whitespace() {
                i += 1;
            } else {
                out.push(Token {
                    text: c.to_string(),
                    line: index + 1,
                });
                i += 1;
            }
        }
    }
    out
}

fn is_ident(text: &str) -> bool {
    text.chars()
        .next()
        .is_some_and(|c| c.is_alphabetic() || c == '_')
}

/// A path as written, with the line of its first segment.
#[derive(Debug, Clone)]
struct WrittenPath {
    segments: Vec<String>,
    line: usize,
    /// Written with a leading `::` (then the first segment is an external crate).
    global: bool,
}

/// Parses a use tree at `tokens[*at]`, appending every full path it names under `prefix`.
fn use_tree(
    tokens: &[Token],
    at: &mut usize,
    prefix: &[String],
    line: usize,
    out: &mut Vec<WrittenPath>,
) {
    let mut path = prefix.to_vec();
    let mut line = line;
    loop {
        let Some(token) = tokens.get(*at) else { return };
        if token.text == "{" {
            *at += 1;
            loop {
                match tokens.get(*at).map(|t| t.text.as_str()) {
                    None => return,
                    Some("}") => {
                        *at += 1;
                        return;
                    }
                    Some(",") => *at += 1,
                    Some(_) => use_tree(tokens, at, &path, line, out),
                }
            }
        }
        if token.text == "*" {
            *at += 1;
            out.push(WrittenPath {
                segments: path,
                line,
                global: false,
            });
            return;
        }
        if !is_ident(&token.text) {
            return;
        }
        if path.is_empty() {
            line = token.line;
        }
        if token.text != "self" || path.is_empty() {
            path.push(token.text.clone());
        }
        *at += 1;
        if tokens.get(*at).map(|t| t.text.as_str()) == Some("::") {
            *at += 1;
            continue;
        }
        if tokens.get(*at).map(|t| t.text.as_str()) == Some("as") {
            *at += 2;
        }
        out.push(WrittenPath {
            segments: path,
            line,
            global: false,
        });
        return;
    }
}

/// Every path in a file's code that may name a module: `use` trees and `x::y` paths.
/// Returned with the module (inline `mod name { }` blocks included) they are written in.
fn written_paths(tokens: &[Token], file_module: &[String]) -> Vec<(Vec<String>, WrittenPath)> {
    let mut out = Vec::new();
    let mut modules: Vec<(String, usize)> = Vec::new();
    let mut depth = 0usize;
    let mut i = 0;
    let current = |modules: &[(String, usize)]| -> Vec<String> {
        let mut path = file_module.to_vec();
        path.extend(modules.iter().map(|(name, _)| name.clone()));
        path
    };
    while i < tokens.len() {
        let text = tokens[i].text.as_str();
        let previous = i.checked_sub(1).map(|p| tokens[p].text.as_str());
        match text {
            "{" => {
                depth += 1;
                i += 1;
            }
            "}" => {
                depth = depth.saturating_sub(1);
                if modules.last().is_some_and(|(_, d)| *d == depth) {
                    modules.pop();
                }
                i += 1;
            }
            "mod"
                if tokens.get(i + 2).map(|t| t.text.as_str()) == Some("{")
                    && tokens.get(i + 1).is_some_and(|t| is_ident(&t.text)) =>
            {
                modules.push((tokens[i + 1].text.clone(), depth));
                depth += 1;
                i += 3;
            }
            "use" if previous != Some("::") => {
                let mut found = Vec::new();
                let mut at = i + 1;
                let global = tokens.get(at).map(|t| t.text.as_str()) == Some("::");
                if global {
                    at += 1;
                }
                use_tree(tokens, &mut at, &[], tokens[i].line, &mut found);
                let module = current(&modules);
                for mut path in found {
                    path.global = global;
                    out.push((module.clone(), path));
                }
                i = at.max(i + 1);
            }
            _ if is_ident(text)
                && previous != Some("::")
                && tokens.get(i + 1).map(|t| t.text.as_str()) == Some("::") =>
            {
                let global = false;
                let line = tokens[i].line;
                let mut segments = vec![text.to_string()];
                let mut at = i + 1;
                while tokens.get(at).map(|t| t.text.as_str()) == Some("::")
                    && tokens.get(at + 1).is_some_and(|t| is_ident(&t.text))
                {
                    segments.push(tokens[at + 1].text.clone());
                    at += 2;
                }
                out.push((
                    current(&modules),
                    WrittenPath {
                        segments,
                        line,
                        global,
                    },
                ));
                i = at;
            }
            "::" if previous.is_none_or(|p| !is_ident(p) && p != ">") => {
                // A leading `::name` names an external crate.
                if let Some(name) = tokens.get(i + 1).filter(|t| is_ident(&t.text)) {
                    out.push((
                        current(&modules),
                        WrittenPath {
                            segments: vec![name.text.clone()],
                            line: name.line,
                            global: true,
                        },
                    ));
                }
                i += 2;
            }
            _ => i += 1,
        }
    }
    out
}

/// What a written path refers to.
#[derive(Debug, Clone, PartialEq, Eq)]
enum Target {
    /// A path inside the crate, from its root.
    Crate(Vec<String>),
    /// An external crate.
    External(String),
    /// `super::` climbing past the crate root.
    AboveRoot,
    /// Not a module path we know (std, a local item, a type's associated item...).
    Other,
}

struct Tree {
    /// Every module of the library, by path from the root.
    modules: BTreeSet<Vec<String>>,
    /// Dependency names as written in paths (`-` read as `_`).
    dependencies: BTreeSet<String>,
    /// Root re-exports (`pub use ops::app;` in lib.rs): name -> path.
    reexports: BTreeMap<String, Vec<String>>,
}

impl Tree {
    fn resolve(&self, module: &[String], path: &WrittenPath) -> Target {
        let first = path.segments[0].as_str();
        if path.global {
            return Target::External(first.to_string());
        }
        let absolute: Vec<String> = match first {
            "crate" | "eigenzeit" => path.segments[1..].to_vec(),
            "super" => {
                let mut base = module.to_vec();
                let mut rest = path.segments.as_slice();
                while rest.first().is_some_and(|s| s == "super") {
                    if base.pop().is_none() {
                        return Target::AboveRoot;
                    }
                    rest = &rest[1..];
                }
                base.extend(rest.iter().cloned());
                base
            }
            "self" => {
                let mut base = module.to_vec();
                base.extend(path.segments[1..].iter().cloned());
                base
            }
            _ => {
                let mut child = module.to_vec();
                child.push(first.to_string());
                if self.modules.contains(&child) {
                    child.extend(path.segments[1..].iter().cloned());
                    child
                } else if self.dependencies.contains(first) {
                    return Target::External(first.to_string());
                } else {
                    return Target::Other;
                }
            }
        };
        match absolute.first() {
            Some(head) if !self.modules.contains(&vec![head.clone()]) => {
                match self.reexports.get(head) {
                    Some(original) => Target::Crate(original.clone()),
                    None => Target::Other,
                }
            }
            Some(_) => Target::Crate(absolute),
            None => Target::Other,
        }
    }

    /// The longest prefix of `path` that is a module.
    fn module_of(&self, path: &[String]) -> Vec<String> {
        (0..=path.len())
            .rev()
            .map(|n| path[..n].to_vec())
            .find(|prefix| self.modules.contains(prefix))
            .unwrap_or_default()
    }
}

fn manifest_dir() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
}

/// The names under `[dependencies]` in Cargo.toml.
fn dependencies() -> BTreeSet<String> {
    let manifest = fs::read_to_string(manifest_dir().join("Cargo.toml")).expect("Cargo.toml");
    let mut in_section = false;
    let mut names = BTreeSet::new();
    for line in manifest.lines() {
        let line = line.trim();
        if line.starts_with('[') {
            in_section = line == "[dependencies]";
            continue;
        }
        if in_section {
            if let Some((name, _)) = line.split_once('=') {
                let name = name.trim();
                if !name.is_empty() && !name.starts_with('#') {
                    names.insert(name.replace('-', "_"));
                }
            }
        }
    }
    names
}

fn rust_files(dir: &Path, out: &mut Vec<PathBuf>) {
    let Ok(entries) = fs::read_dir(dir) else {
        return;
    };
    for entry in entries.flatten() {
        let path = entry.path();
        if path.is_dir() {
            rust_files(&path, out);
        } else if path.extension().is_some_and(|e| e == "rs") {
            out.push(path);
        }
    }
}

/// The module a file under src/ defines (`None` for main.rs, a crate of its own).
fn file_module(relative: &Path) -> Option<Vec<String>> {
    let mut parts: Vec<String> = relative
        .iter()
        .map(|p| p.to_string_lossy().to_string())
        .collect();
    let last = parts.pop()?;
    match last.as_str() {
        "main.rs" if parts.is_empty() => None,
        "lib.rs" if parts.is_empty() => Some(Vec::new()),
        "mod.rs" => Some(parts),
        other => {
            parts.push(other.trim_end_matches(".rs").to_string());
            Some(parts)
        }
    }
}

struct Source {
    display: String,
    /// `None`: src/main.rs.
    module: Option<Vec<String>>,
    tokens: Vec<Token>,
}

fn read_sources(src: &Path) -> Vec<Source> {
    let mut files = Vec::new();
    rust_files(src, &mut files);
    files.sort();
    files
        .into_iter()
        .map(|path| {
            let relative = path.strip_prefix(src).expect("under src").to_path_buf();
            let text = fs::read_to_string(&path).expect("readable source");
            Source {
                display: format!("src/{}", relative.display()),
                module: file_module(&relative),
                tokens: tokens(&strip(&text)),
            }
        })
        .collect()
}

/// Checks the tree under `src` and returns every finding.
fn check(src: &Path, dependencies: BTreeSet<String>) -> Vec<Finding> {
    let sources = read_sources(src);
    let mut modules: BTreeSet<Vec<String>> =
        sources.iter().filter_map(|s| s.module.clone()).collect();
    // Inline modules (`mod tests { }`) are modules too.
    for source in &sources {
        let Some(module) = &source.module else {
            continue;
        };
        for window in source.tokens.windows(3) {
            if window[0].text == "mod" && is_ident(&window[1].text) && window[2].text == "{" {
                let mut inline = module.clone();
                inline.push(window[1].text.clone());
                modules.insert(inline);
            }
        }
    }
    let mut tree = Tree {
        modules,
        dependencies,
        reexports: BTreeMap::new(),
    };
    // Root re-exports, so `crate::app` counts as the layer it comes from.
    if let Some(root) = sources.iter().find(|s| s.module.as_deref() == Some(&[])) {
        for (_, path) in written_paths(&root.tokens, &[]) {
            if let Some(head) = path.segments.first() {
                if tree.modules.contains(&vec![head.clone()]) && path.segments.len() > 1 {
                    if let Some(last) = path.segments.last() {
                        tree.reexports.insert(last.clone(), path.segments.clone());
                    }
                }
            }
        }
    }

    let mut findings = Vec::new();
    // Sibling edges: parent -> (A', B') -> references.
    let mut edges: BTreeMap<Vec<String>, Graph> = BTreeMap::new();
    for source in &sources {
        let file_module = source.module.clone().unwrap_or_default();
        let layer = match &source.module {
            None => "main".to_string(),
            Some(module) => module.first().cloned().unwrap_or_default(),
        };
        let is_root = source.module.as_deref() == Some(&[]);
        for (module, path) in written_paths(&source.tokens, &file_module) {
            let written = path.segments.join("::");
            let mut report = |message: String| {
                findings.push(Finding {
                    file: source.display.clone(),
                    line: path.line,
                    message,
                })
            };
            match tree.resolve(&module, &path) {
                Target::External(name) => {
                    let allowed = allowed_external(&layer);
                    if let Some(allowed) = allowed {
                        if (tree.dependencies.contains(&name) || path.global)
                            && !allowed.contains(&name.as_str())
                        {
                            report(format!(
                                "{layer} uses the external crate `{name}` (`{written}`); allowed here: {}",
                                if allowed.is_empty() { "std, core and alloc only".to_string() } else { allowed.join(", ") }
                            ));
                        }
                    }
                }
                Target::AboveRoot => report(format!("`{written}` climbs above the crate root")),
                Target::Other => {}
                Target::Crate(target) => {
                    let target_layer = target.first().cloned().unwrap_or_default();
                    if !is_root {
                        if let (Some(from), Some(to)) = (rank(&layer), rank(&target_layer)) {
                            if to > from {
                                report(format!(
                                    "{layer} refers to {target_layer}, a layer above it (`{written}`)"
                                ));
                            }
                        }
                    }
                    if source.module.is_none() {
                        continue;
                    }
                    let target_module = tree.module_of(&target);
                    let common = module
                        .iter()
                        .zip(&target_module)
                        .take_while(|(a, b)| a == b)
                        .count();
                    if common < module.len() && common < target_module.len() {
                        edges
                            .entry(module[..common].to_vec())
                            .or_default()
                            .entry((module[common].clone(), target_module[common].clone()))
                            .or_default()
                            .push((source.display.clone(), path.line));
                    }
                }
            }
        }
    }
    for (parent, graph) in &edges {
        for ((from, to), references) in graph {
            let back: Vec<String> = path_between(graph, to, from);
            if from >= to || back.is_empty() {
                continue;
            }
            // Between the top-level layers, rule 1 already names each reference that goes up.
            if parent.is_empty() && back.iter().chain([from, to]).all(|m| rank(m).is_some()) {
                continue;
            }
            let parent_name = if parent.is_empty() {
                "the crate root".to_string()
            } else {
                format!("crate::{}", parent.join("::"))
            };
            let back_references: Vec<(String, usize)> = back
                .windows(2)
                .filter_map(|w| graph.get(&(w[0].clone(), w[1].clone())))
                .flatten()
                .cloned()
                .collect();
            // Name the side with fewer references (the one to cut, most likely) in full.
            let (listed, other) = if references.len() <= back_references.len() {
                (references.clone(), back_references.len())
            } else {
                (back_references, references.len())
            };
            for (file, line) in listed {
                findings.push(Finding {
                    file,
                    line,
                    message: format!(
                        "import circle under {parent_name}: {from} -> {to} and {} ({other} reference(s) the other way)",
                        back.join(" -> ")
                    ),
                });
            }
        }
    }
    findings.sort();
    findings.dedup();
    findings
}

/// Edges (A', B') between the children of one parent, with the references (file, line).
type Graph = BTreeMap<(String, String), Vec<(String, usize)>>;

/// A path of edges from `from` to `to` (the names along it), empty when there is none.
fn path_between(graph: &Graph, from: &str, to: &str) -> Vec<String> {
    let mut seen = BTreeSet::new();
    let mut stack = vec![vec![from.to_string()]];
    while let Some(route) = stack.pop() {
        let last = route.last().cloned().unwrap_or_default();
        if last == to {
            return route;
        }
        if !seen.insert(last.clone()) {
            continue;
        }
        for (a, b) in graph.keys() {
            if *a == last {
                let mut next = route.clone();
                next.push(b.clone());
                stack.push(next);
            }
        }
    }
    Vec::new()
}

fn report(findings: &[Finding]) -> String {
    let mut text = format!("{RULE}\n\n{} reference(s) break it:\n", findings.len());
    for finding in findings {
        text.push_str(&format!(
            "  {}:{}: {}\n",
            finding.file, finding.line, finding.message
        ));
    }
    text
}

#[test]
fn layers_hold() {
    let findings = check(&manifest_dir().join("src"), dependencies());
    assert!(findings.is_empty(), "{}", report(&findings));
}

/// The checker itself, on a small invented tree: it must catch each kind of breach.
#[test]
fn the_check_catches_each_kind_of_breach() {
    let root = std::env::temp_dir().join(format!("eigenzeit-layers-{}", std::process::id()));
    let _ = fs::remove_dir_all(&root);
    let files: [(&str, &str); 9] = [
        ("lib.rs", "pub mod api; pub mod ops; pub mod physics;\npub use ops::app;\n"),
        (
            "physics/mod.rs",
            "pub mod a; pub mod b;\n// crate::ops::x in a comment is fine\nconst S: &str = \"crate::ops::y\";\nfn f() -> u8 { serde_json::json!(1); 0 }\n",
        ),
        ("physics/a.rs", "use super::b::B;\npub struct A;\n"),
        ("physics/b.rs", "use crate::physics::{a::A, b};\npub struct B;\nfn g() { let _ = super::super::api::X; }\n"),
        ("api/mod.rs", "pub mod x;\nuse crate::{physics, ops};\n"),
        ("api/x.rs", "pub struct X;\nfn h() { crate::ops::run(); let _ = crate::app; }\n"),
        ("ops/mod.rs", "pub fn run() {}\npub fn app() {}\nuse crate::api::x::X;\n"),
        ("physics/c.rs", "use serde::Serialize;\n"),
        ("main.rs", "fn main() { eigenzeit::ops::run(); }\n"),
    ];
    for (name, text) in files {
        let path = root.join(name);
        fs::create_dir_all(path.parent().expect("parent")).expect("mkdir");
        fs::write(&path, text).expect("write");
    }
    let findings = check(
        &root,
        ["serde", "serde_json"]
            .map(String::from)
            .into_iter()
            .collect(),
    );
    let _ = fs::remove_dir_all(&root);
    let text = report(&findings);
    let has = |file: &str, line: usize, needle: &str| {
        findings
            .iter()
            .any(|f| f.file == file && f.line == line && f.message.contains(needle))
    };
    assert!(has("src/physics/mod.rs", 4, "`serde_json`"), "{text}");
    assert!(has("src/physics/c.rs", 1, "`serde`"), "{text}");
    assert!(
        has("src/physics/b.rs", 3, "physics refers to api"),
        "{text}"
    );
    assert!(has("src/api/mod.rs", 2, "api refers to ops"), "{text}");
    assert!(has("src/api/x.rs", 2, "(`crate::ops::run`)"), "{text}");
    assert!(has("src/api/x.rs", 2, "(`crate::app`)"), "{text}");
    assert!(
        has(
            "src/physics/a.rs",
            1,
            "import circle under crate::physics: a -> b and b -> a"
        ),
        "{text}"
    );
    // Comments and strings are not code; main may use every layer; lib.rs may re-export.
    assert!(
        !findings
            .iter()
            .any(|f| f.line == 2 && f.file == "src/physics/mod.rs"),
        "{text}"
    );
    assert!(
        !findings
            .iter()
            .any(|f| f.line == 3 && f.file == "src/physics/mod.rs"),
        "{text}"
    );
    assert!(
        !findings
            .iter()
            .any(|f| f.file == "src/main.rs" || f.file == "src/lib.rs"),
        "{text}"
    );
    // ops -> api is the allowed direction; api <-> ops is reported as a layer breach above.
    assert!(
        !findings
            .iter()
            .any(|f| f.file == "src/ops/mod.rs" && f.message.contains("layer above")),
        "{text}"
    );
}
