/* Schema reading for the /docs page: resolves $ref, allOf, arrays and oneOf/nullable into
   rows of a field table. Inlined into page.html (before page.js) by src/api/docs/mod.rs. */
const EzDom = (function () {
  'use strict';

  /* Creates an element; props: class, text, on<event>, or any attribute. */
  function el(tag, props, children) {
    const node = document.createElement(tag);
    if (props) {
      for (const [key, value] of Object.entries(props)) {
        if (value === undefined || value === null || value === false) continue;
        if (key === 'class') node.className = value;
        else if (key === 'text') node.textContent = value;
        else if (key.startsWith('on')) node.addEventListener(key.slice(2), value);
        else node.setAttribute(key, value === true ? '' : String(value));
      }
    }
    return append(node, children);
  }

  function append(node, children) {
    if (children === undefined || children === null || children === false) return node;
    if (Array.isArray(children)) {
      children.forEach((child) => append(node, child));
    } else if (typeof children === 'string' || typeof children === 'number') {
      node.appendChild(document.createTextNode(String(children)));
    } else {
      node.appendChild(children);
    }
    return node;
  }

  /* Text with `backtick spans` as <code>. */
  function inline(text) {
    const fragment = document.createDocumentFragment();
    String(text).split('`').forEach((part, index) => {
      if (!part) return;
      fragment.appendChild(index % 2 ? el('code', null, part) : document.createTextNode(part));
    });
    return fragment;
  }

  /* Paragraphs (blank-line separated); single line breaks read as spaces. */
  function prose(text, extraClass) {
    const wrap = el('div', { class: extraClass ? 'prose ' + extraClass : 'prose' });
    String(text).split(/\n\s*\n/).forEach((paragraph) => {
      const flat = paragraph.replace(/\s*\n\s*/g, ' ').trim();
      if (flat) wrap.appendChild(el('p', null, inline(flat)));
    });
    return wrap;
  }

  /* A value as readable text (JSON for objects and arrays). */
  function show(value) {
    if (typeof value === 'string') return value;
    try {
      return JSON.stringify(value);
    } catch (error) {
      return String(value);
    }
  }

  return { el, append, inline, prose, show };
})();

const EzSchema = (function () {
  'use strict';
  const { el, inline, show } = EzDom;
  const MAX_DEPTH = 7;
  let documentRoot = {};

  function setDocument(spec) {
    documentRoot = spec || {};
  }

  /* The target of a local JSON pointer such as `#/components/schemas/Name`. */
  function resolvePointer(ref) {
    if (typeof ref !== 'string' || !ref.startsWith('#/')) return undefined;
    let node = documentRoot;
    for (const raw of ref.slice(2).split('/')) {
      let key;
      try {
        key = decodeURIComponent(raw);
      } catch (error) {
        return undefined;
      }
      key = key.replace(/~1/g, '/').replace(/~0/g, '~');
      if (node === null || typeof node !== 'object' || !(key in node)) return undefined;
      node = node[key];
    }
    return node;
  }

  const refName = (ref) => String(ref).split('/').pop();

  /* Follows $ref chains of non-schema objects (parameters, bodies, responses). */
  function deref(object) {
    let current = object;
    for (let guard = 0; guard < 16 && current && current.$ref; guard++) {
      current = resolvePointer(current.$ref);
    }
    return current || {};
  }

  /* Unwraps $ref and "X or null" wrappers: {schema, name, nullable, description, cycle, seen}. */
  function unwrap(input, seenRefs) {
    let schema = input && typeof input === 'object' ? input : {};
    let seen = seenRefs || new Set();
    let name = null;
    let nullable = false;
    let description = schema.description;
    for (let guard = 0; guard < 16; guard++) {
      if (schema.$ref) {
        name = refName(schema.$ref);
        const target = resolvePointer(schema.$ref);
        if (!target || typeof target !== 'object') {
          return { schema: {}, name, nullable, description, cycle: false, seen };
        }
        if (seen.has(schema.$ref)) {
          return { schema: target, name, nullable, description: description || target.description, cycle: true, seen };
        }
        seen = new Set(seen);
        seen.add(schema.$ref);
        schema = target;
        if (description === undefined) description = schema.description;
        continue;
      }
      const choices = schema.oneOf || schema.anyOf;
      if (Array.isArray(choices)) {
        const present = choices.filter((choice) => !(choice && choice.type === 'null'));
        if (present.length === 1 && present.length < choices.length) {
          nullable = true;
          schema = present[0] || {};
          if (description === undefined) description = schema.description;
          continue;
        }
      }
      break;
    }
    if (Array.isArray(schema.type) && schema.type.includes('null')) nullable = true;
    if (schema.nullable === true) nullable = true;
    return { schema, name, nullable, description, cycle: false, seen };
  }

  function baseTypes(schema) {
    if (Array.isArray(schema.type)) return schema.type.filter((type) => type !== 'null');
    return schema.type ? [schema.type] : [];
  }

  const isArray = (schema) => baseTypes(schema).includes('array') || (schema.items !== undefined && !schema.properties);
  const isObjectLike = (schema) =>
    !isArray(schema) &&
    (Boolean(schema.properties) || Array.isArray(schema.allOf) || baseTypes(schema).includes('object'));

  /* The non-null alternatives of a oneOf/anyOf with more than one. */
  function alternatives(schema) {
    const choices = schema.oneOf || schema.anyOf;
    if (!Array.isArray(choices)) return null;
    const present = choices.filter((choice) => !(choice && choice.type === 'null'));
    return present.length > 1 ? present : null;
  }

  function typeLabel(unwrapped, depth) {
    const schema = unwrapped.schema;
    const level = depth || 0;
    let label;
    if (level > MAX_DEPTH) {
      label = '…';
    } else if (isArray(schema)) {
      label = 'array of ' + typeLabel(unwrap(schema.items, unwrapped.seen), level + 1);
    } else if (unwrapped.name && (isObjectLike(schema) || alternatives(schema))) {
      label = unwrapped.name;
    } else if (alternatives(schema)) {
      label = alternatives(schema).map((choice) => typeLabel(unwrap(choice, unwrapped.seen), level + 1)).join(' | ');
    } else {
      const types = baseTypes(schema);
      label = types.length ? types.join(' | ') : isObjectLike(schema) ? 'object' : 'any';
      if (schema.format) label += ' (' + schema.format + ')';
    }
    if (unwrapped.nullable) label += ' or null';
    return label;
  }

  /* Constraints and hints worth a line under the description. */
  function notes(schema) {
    const out = [];
    if (Array.isArray(schema.enum)) out.push('one of: ' + schema.enum.map(show).join(', '));
    if (schema.const !== undefined) out.push('always ' + show(schema.const));
    if (schema.default !== undefined) out.push('default ' + show(schema.default));
    const low = schema.exclusiveMinimum !== undefined ? '> ' + schema.exclusiveMinimum : schema.minimum !== undefined ? '≥ ' + schema.minimum : null;
    const high = schema.exclusiveMaximum !== undefined ? '< ' + schema.exclusiveMaximum : schema.maximum !== undefined ? '≤ ' + schema.maximum : null;
    if (low || high) out.push('range ' + [low, high].filter(Boolean).join(' and '));
    if (schema.minItems !== undefined || schema.maxItems !== undefined) {
      out.push('items: ' + (schema.minItems !== undefined ? schema.minItems : 0) + ' to ' + (schema.maxItems !== undefined ? schema.maxItems : 'any number'));
    }
    if (schema.minLength !== undefined || schema.maxLength !== undefined) {
      out.push('length: ' + (schema.minLength || 0) + ' to ' + (schema.maxLength !== undefined ? schema.maxLength : 'any'));
    }
    if (schema.pattern) out.push('pattern ' + schema.pattern);
    if (schema.example !== undefined && (typeof schema.example !== 'object' || schema.example === null)) {
      out.push('example ' + show(schema.example));
    }
    if (schema.readOnly) out.push('answers only');
    if (schema.writeOnly) out.push('requests only');
    if (schema.deprecated) out.push('deprecated');
    if (schema.discriminator && schema.discriminator.propertyName) {
      out.push('the field ' + schema.discriminator.propertyName + ' says which shape applies');
    }
    return out;
  }

  /* Properties and required names of an object schema, with allOf parts merged. */
  function flatten(schema, seen) {
    const merged = { properties: [], required: new Set(), additional: null };
    const names = new Set();
    (function add(part, seenHere, level) {
      if (!part || level > MAX_DEPTH) return;
      const unwrapped = unwrap(part, seenHere);
      if (unwrapped.cycle) return;
      const current = unwrapped.schema;
      if (Array.isArray(current.allOf)) current.allOf.forEach((piece) => add(piece, unwrapped.seen, level + 1));
      if (current.properties && typeof current.properties === 'object') {
        for (const [key, value] of Object.entries(current.properties)) {
          if (names.has(key)) continue;
          names.add(key);
          merged.properties.push({ key, schema: value, seen: unwrapped.seen });
        }
      }
      if (Array.isArray(current.required)) current.required.forEach((key) => merged.required.add(key));
      if (current.additionalProperties && typeof current.additionalProperties === 'object') {
        merged.additional = { schema: current.additionalProperties, seen: unwrapped.seen };
      }
    })(schema, seen, 0);
    return merged;
  }

  function objectRows(schema, seen, prefix, depth, rows) {
    if (depth > MAX_DEPTH) {
      rows.push({ path: prefix + '…', depth, type: '', description: 'Nested deeper; see /openapi.json.' });
      return;
    }
    const merged = flatten(schema, seen);
    for (const entry of merged.properties) {
      const unwrapped = unwrap(entry.schema, entry.seen);
      const path = prefix + entry.key;
      rows.push({
        path, depth, type: typeLabel(unwrapped), required: merged.required.has(entry.key),
        description: unwrapped.description, notes: notes(unwrapped.schema),
      });
      if (!unwrapped.cycle) childRows(unwrapped, path, depth, rows);
    }
    if (merged.additional) {
      const unwrapped = unwrap(merged.additional.schema, merged.additional.seen);
      const path = prefix + '{key}';
      rows.push({
        path, depth, type: typeLabel(unwrapped), required: false,
        description: unwrapped.description || 'Any further key, with a value of this type.', notes: notes(unwrapped.schema),
      });
      if (!unwrapped.cycle) childRows(unwrapped, path, depth, rows);
    }
  }

  /* Rows below a field: an object's fields, an array's items, each shape of a oneOf. */
  function childRows(unwrapped, path, depth, rows) {
    const schema = unwrapped.schema;
    if (depth > MAX_DEPTH) return;
    if (isArray(schema)) {
      const items = unwrap(schema.items, unwrapped.seen);
      if (!items.cycle) childRows(items, path + '[]', depth, rows);
    } else if (alternatives(schema)) {
      alternatives(schema).forEach((choice, index) => {
        const shape = unwrap(choice, unwrapped.seen);
        rows.push({
          path, depth: depth + 1, variant: 'shape ' + (index + 1) + (shape.name ? ': ' + shape.name : ''),
          type: typeLabel(shape), description: shape.description, notes: notes(shape.schema),
        });
        if (!shape.cycle) childRows(shape, path, depth + 1, rows);
      });
    } else if (isObjectLike(schema)) {
      objectRows(schema, unwrapped.seen, path ? path + '.' : '', depth + 1, rows);
    }
  }

  function fieldCell(row) {
    const cell = el('td', { class: 'field', 'data-label': 'Field' });
    cell.style.paddingLeft = (0.6 + Math.max(0, row.depth) * 0.9) + 'rem';
    if (row.variant) {
      cell.appendChild(el('span', null, (row.path ? row.path + ' ' : '') + '(' + row.variant + ')'));
      return cell;
    }
    const cut = row.path.lastIndexOf('.');
    const code = el('code');
    if (cut > 0) code.appendChild(el('span', { class: 'parent' }, row.path.slice(0, cut + 1)));
    code.appendChild(document.createTextNode(cut > 0 ? row.path.slice(cut + 1) : row.path));
    cell.appendChild(code);
    return cell;
  }

  function fieldTable(rows, label) {
    const body = el('tbody');
    for (const row of rows) {
      const description = el('td', { 'data-label': 'Description' });
      if (row.description) description.appendChild(inline(String(row.description).replace(/\s*\n\s*/g, ' ')));
      if (row.notes && row.notes.length) description.appendChild(el('span', { class: 'notes' }, row.notes.join(' · ')));
      body.appendChild(el('tr', { class: row.variant ? 'variant' : null }, [
        fieldCell(row),
        el('td', { class: 'type', 'data-label': 'Type' }, el('code', null, row.type || '')),
        el('td', { 'data-label': 'Presence' }, row.variant ? '' : row.required
          ? el('span', { class: 'tag-req' }, 'required')
          : el('span', { class: 'tag-opt' }, 'optional')),
        description,
      ]));
    }
    return el('div', { class: 'table-wrap' }, el('table', null, [
      el('caption', { class: 'visually-hidden' }, label),
      el('thead', null, el('tr', null, ['Field', 'Type', 'Presence', 'Description'].map((name) => el('th', { scope: 'col' }, name)))),
      body,
    ]));
  }

  /* A schema as a heading line, its description, its field table and its example. */
  function block(schema, label, options) {
    const settings = options || {};
    const unwrapped = unwrap(schema, new Set());
    const box = el('div', { class: 'schema' });
    box.appendChild(el('p', { class: 'schema-head' }, [el('span', { class: 'muted' }, 'Schema: '), el('code', null, typeLabel(unwrapped))]));
    if (unwrapped.description && !settings.hideDescription) box.appendChild(EzDom.prose(unwrapped.description, 'small'));
    const rows = [];
    if (isObjectLike(unwrapped.schema) && !alternatives(unwrapped.schema)) {
      objectRows(unwrapped.schema, unwrapped.seen, '', 0, rows);
    } else {
      childRows(unwrapped, '', -1, rows);
    }
    if (rows.length) box.appendChild(fieldTable(rows, label));
    const topNotes = notes(unwrapped.schema).filter((note) => !note.startsWith('example'));
    if (topNotes.length) box.appendChild(el('p', { class: 'notes' }, topNotes.join(' · ')));
    if (settings.showExample && unwrapped.schema.example !== undefined) {
      box.appendChild(el('p', { class: 'small muted' }, 'Example'));
      box.appendChild(el('pre', null, el('code', null, JSON.stringify(unwrapped.schema.example, null, 2))));
    }
    return box;
  }

  /* The schema's own example, if any (following $ref). */
  function exampleOf(schema) {
    const unwrapped = unwrap(schema, new Set());
    return unwrapped.schema.example;
  }

  return { setDocument, resolvePointer, deref, unwrap, typeLabel, block, exampleOf };
})();
