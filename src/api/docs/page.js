/* The /docs page: reads /openapi.json (same origin) and renders the contents, one card per
   operation with its "try it" panel. Inlined into page.html by src/api/docs/mod.rs. */
(function () {
  'use strict';
  const { el, inline, prose, show } = EzDom;
  const METHODS = ['get', 'post', 'put', 'patch', 'delete', 'head', 'options', 'trace'];

  const byId = (id) => document.getElementById(id);
  const slug = (text) => String(text).toLowerCase().replace(/[^a-z0-9_-]+/g, '-').replace(/^-+|-+$/g, '') || 'x';

  function operationAnchor(method, path, operation) {
    return 'op-' + slug(operation.operationId || method + '-' + path);
  }

  /* Operations grouped by tag, in the document's tag order (then any other tag, then untagged). */
  function groupByTag(spec) {
    const groups = new Map();
    for (const tag of spec.tags || []) {
      if (tag && tag.name) groups.set(tag.name, { tag, operations: [] });
    }
    for (const [path, item] of Object.entries(spec.paths || {})) {
      if (!item || typeof item !== 'object') continue;
      for (const method of METHODS) {
        const operation = item[method];
        if (!operation) continue;
        const tags = Array.isArray(operation.tags) && operation.tags.length ? operation.tags : ['other'];
        const name = tags[0];
        if (!groups.has(name)) groups.set(name, { tag: { name }, operations: [] });
        const parameters = (item.parameters || []).concat(operation.parameters || []).map(EzSchema.deref);
        groups.get(name).operations.push({ method, path, operation, parameters });
      }
    }
    return [...groups.values()].filter((group) => group.operations.length);
  }

  function parameterExample(parameter) {
    if (parameter.example !== undefined) return parameter.example;
    if (parameter.examples && typeof parameter.examples === 'object') {
      const first = Object.values(parameter.examples)[0];
      if (first && first.value !== undefined) return first.value;
    }
    const schema = EzSchema.unwrap(parameter.schema, new Set()).schema;
    if (schema.example !== undefined) return schema.example;
    return undefined;
  }

  function parametersTable(parameters) {
    const rows = parameters.map((parameter) => {
      const example = parameterExample(parameter);
      const schema = parameter.schema ? EzSchema.typeLabel(EzSchema.unwrap(parameter.schema, new Set())) : '';
      return el('tr', null, [
        el('td', { class: 'field', 'data-label': 'Name' }, el('code', null, parameter.name || '')),
        el('td', { 'data-label': 'In' }, parameter.in || ''),
        el('td', { 'data-label': 'Presence' }, parameter.required
          ? el('span', { class: 'tag-req' }, 'required')
          : el('span', { class: 'tag-opt' }, 'optional')),
        el('td', { class: 'type', 'data-label': 'Type' }, el('code', null, schema)),
        el('td', { 'data-label': 'Description' }, parameter.description ? inline(String(parameter.description).replace(/\s*\n\s*/g, ' ')) : ''),
        el('td', { class: 'example', 'data-label': 'Example' }, example === undefined ? '' : el('code', null, show(example))),
      ]);
    });
    return el('div', { class: 'table-wrap' }, el('table', null, [
      el('caption', { class: 'visually-hidden' }, 'Parameters'),
      el('thead', null, el('tr', null, ['Name', 'In', 'Presence', 'Type', 'Description', 'Example'].map((name) => el('th', { scope: 'col' }, name)))),
      el('tbody', null, rows),
    ]));
  }

  /* The request body's preferred media type, schema and example. */
  function bodyInfo(operation) {
    if (!operation.requestBody) return null;
    const body = EzSchema.deref(operation.requestBody);
    const content = body.content || {};
    const types = Object.keys(content);
    if (!types.length) return null;
    const mediaType = types.find((type) => /json/.test(type)) || types[0];
    const media = content[mediaType] || {};
    let example = media.example;
    if (example === undefined && media.examples && typeof media.examples === 'object') {
      const first = Object.values(media.examples)[0];
      if (first) example = EzSchema.deref(first).value;
    }
    if (example === undefined && media.schema) example = EzSchema.exampleOf(media.schema);
    return { body, mediaType, types, media, example };
  }

  function exampleText(example, mediaType) {
    if (example === undefined) return /json/.test(mediaType) ? '{\n  \n}' : '';
    if (typeof example === 'string' && !/json/.test(mediaType)) return example;
    return JSON.stringify(example, null, 2);
  }

  function requestBodySection(info, anchor) {
    const section = el('section', { 'aria-labelledby': anchor + '-body' });
    section.appendChild(el('h4', { id: anchor + '-body' }, 'Request body'));
    const line = [el('code', null, info.types.join(', ')), info.body.required ? ' · ' : '', info.body.required ? el('span', { class: 'tag-req' }, 'required') : ''];
    section.appendChild(el('p', { class: 'small' }, line));
    if (info.body.description) section.appendChild(prose(info.body.description, 'small'));
    if (info.media.schema) section.appendChild(EzSchema.block(info.media.schema, 'Fields of the request body'));
    if (info.example !== undefined) {
      section.appendChild(el('p', { class: 'small muted' }, 'Example'));
      section.appendChild(el('pre', null, el('code', null, exampleText(info.example, info.mediaType))));
    }
    return section;
  }

  function isProblemSchema(schema) {
    return Boolean(schema && schema.$ref && /\/Problem$/.test(schema.$ref));
  }

  /* One response: status and description on one line, then media types, schema and headers. */
  function responseItem(status, response) {
    const label = 'Fields of the ' + status + ' answer';
    const item = el('li', { class: 'response' });
    const head = el('div', { class: 'response-head' }, el('span', { class: 'status s-' + String(status).charAt(0) }, status));
    head.appendChild(response.description ? prose(response.description, 'small') : el('span'));
    item.appendChild(head);
    const body = el('div', { class: 'response-body' });
    for (const [mediaType, media] of Object.entries(response.content || {})) {
      const schema = media && media.schema;
      if (isProblemSchema(schema)) {
        body.appendChild(el('p', { class: 'small' }, [el('code', null, mediaType), ' · a problem; see ', el('a', { href: '#problem-codes' }, 'Problem codes')]));
        continue;
      }
      const line = [el('code', null, mediaType)];
      if (schema) line.push(' · ', el('code', null, EzSchema.typeLabel(EzSchema.unwrap(schema, new Set()))));
      body.appendChild(el('p', { class: 'small' }, line));
      if (schema) {
        const unwrapped = EzSchema.unwrap(schema, new Set());
        const plain = !unwrapped.schema.properties && !unwrapped.schema.allOf && !unwrapped.schema.items && !unwrapped.schema.oneOf && !unwrapped.schema.anyOf;
        if (!plain) {
          body.appendChild(el('details', null, [
            el('summary', null, 'Fields of the ' + status + ' answer'),
            EzSchema.block(schema, label + ' (' + mediaType + ')', { showExample: true }),
          ]));
        }
      }
      if (media && media.example !== undefined) {
        body.appendChild(el('pre', null, el('code', null, exampleText(media.example, mediaType))));
      }
    }
    for (const [name, header] of Object.entries(response.headers || {})) {
      const resolved = EzSchema.deref(header);
      body.appendChild(el('p', { class: 'small' }, [el('span', { class: 'muted' }, 'Header '), el('code', null, name), resolved.description ? [' · ', inline(resolved.description)] : '']));
    }
    if (body.childNodes.length) item.appendChild(body);
    return item;
  }

  function responsesList(responses, anchor) {
    const items = Object.entries(responses || {}).map(([status, raw]) => responseItem(status, EzSchema.deref(raw)));
    return el('ul', { class: 'responses', 'aria-labelledby': anchor + '-responses' }, items);
  }

  function operationCard(entry) {
    const { method, path, operation, parameters } = entry;
    const anchor = entry.anchor;
    const card = el('article', { class: 'operation m-' + method, id: anchor, 'aria-labelledby': anchor + '-title', tabindex: '-1' });
    card.appendChild(el('h3', { id: anchor + '-title' }, [
      el('span', { class: 'method' }, method.toUpperCase()),
      el('span', { class: 'path' }, path),
      el('a', { class: 'anchor', href: '#' + anchor, 'aria-label': 'Link to ' + method.toUpperCase() + ' ' + path }, '#'),
    ]));
    if (operation.deprecated) card.appendChild(el('p', { class: 'tag-req' }, 'Deprecated'));
    if (operation.summary) card.appendChild(el('p', { class: 'summary' }, inline(operation.summary)));
    if (operation.description && operation.description !== operation.summary) card.appendChild(prose(operation.description));

    const usable = parameters.filter((parameter) => parameter && parameter.name);
    if (usable.length) {
      card.appendChild(el('h4', null, 'Parameters'));
      card.appendChild(parametersTable(usable));
    }
    const body = bodyInfo(operation);
    if (body) card.appendChild(requestBodySection(body, anchor));
    card.appendChild(el('h4', { id: anchor + '-responses' }, 'Responses'));
    card.appendChild(responsesList(operation.responses, anchor));
    card.appendChild(EzTry.panel(entry, usable, body, exampleText, parameterExample));
    return card;
  }

  function renderContents(groups) {
    const list = byId('contents-list');
    list.textContent = '';
    for (const group of groups) {
      const items = group.operations.map((entry) => el('li', { 'data-anchor': entry.anchor }, el('a', { class: 'op-link m-' + entry.method, href: '#' + entry.anchor }, [
        el('span', { class: 'method' }, entry.method.toUpperCase()),
        el('span', { class: 'path' }, entry.path),
      ])));
      list.appendChild(el('li', { 'data-tag': group.anchor }, [
        el('a', { class: 'tag-link', href: '#' + group.anchor }, group.tag.name),
        el('ul', null, items),
      ]));
    }
  }

  function renderOperations(groups) {
    const container = byId('operations');
    container.textContent = '';
    for (const group of groups) {
      const section = el('section', { class: 'tag-section', id: group.anchor, 'aria-labelledby': group.anchor + '-title' });
      section.appendChild(el('h2', { id: group.anchor + '-title' }, group.tag.name));
      if (group.tag.description) section.appendChild(prose(group.tag.description));
      group.operations.forEach((entry) => section.appendChild(operationCard(entry)));
      container.appendChild(section);
    }
  }

  /* Hides operations (cards and contents links) that do not contain every word typed. */
  function applyFilter(groups) {
    const words = byId('filter').value.toLowerCase().split(/\s+/).filter(Boolean);
    let shown = 0;
    let total = 0;
    for (const group of groups) {
      let groupShown = 0;
      for (const entry of group.operations) {
        total += 1;
        const visible = words.every((word) => entry.haystack.includes(word));
        if (visible) { shown += 1; groupShown += 1; }
        const card = byId(entry.anchor);
        if (card) card.hidden = !visible;
        const link = document.querySelector('#contents-list li[data-anchor="' + entry.anchor + '"]');
        if (link) link.hidden = !visible;
      }
      const section = byId(group.anchor);
      if (section) section.hidden = groupShown === 0;
      const tagItem = document.querySelector('#contents-list li[data-tag="' + group.anchor + '"]');
      if (tagItem) tagItem.hidden = groupShown === 0;
    }
    byId('filter-count').textContent = words.length ? shown + ' of ' + total + ' operations shown' : '';
  }

  function renderHeader(spec) {
    const info = spec.info || {};
    if (info.title) {
      byId('service-title').textContent = info.title;
      document.title = info.title + ': API reference';
    }
    if (info.version) {
      const version = byId('service-version');
      version.textContent = 'version ' + info.version;
      version.hidden = false;
    }
    const description = byId('service-description');
    description.textContent = '';
    if (info.description) description.appendChild(prose(info.description));
    if (spec.openapi) byId('openapi-version').textContent = spec.openapi;
    if (info.license && info.license.name) byId('license-line').textContent = 'Licence: ' + info.license.name + '.';
  }

  function renderProblemFields() {
    const schemas = (EzSchema.resolvePointer('#/components/schemas') || {});
    if (!schemas.Problem) return;
    const holder = byId('problem-fields');
    holder.textContent = '';
    holder.appendChild(el('details', null, [
      el('summary', null, 'Fields of every problem answer'),
      EzSchema.block({ $ref: '#/components/schemas/Problem' }, 'Fields of a problem answer', { showExample: true }),
    ]));
  }

  /* After rendering, go to the fragment the address names (the browser tried before it existed). */
  function revisitFragment() {
    if (!location.hash || location.hash.length < 2) return;
    let id;
    try {
      id = decodeURIComponent(location.hash.slice(1));
    } catch (error) {
      return;
    }
    const target = byId(id);
    if (target) {
      target.scrollIntoView({ behavior: 'instant', block: 'start' });
      if (target.hasAttribute('tabindex')) target.focus({ preventScroll: true });
    }
  }

  async function start() {
    const status = byId('load-status');
    let spec;
    try {
      const response = await fetch('/openapi.json', { headers: { Accept: 'application/json' } });
      if (!response.ok) throw new Error('HTTP ' + response.status);
      spec = await response.json();
    } catch (error) {
      status.textContent = 'The API description could not be read from /openapi.json (' + error.message + '). The problem codes below still apply.';
      status.classList.add('error');
      status.setAttribute('role', 'alert');
      return;
    }
    EzSchema.setDocument(spec);
    const groups = groupByTag(spec);
    const used = new Set();
    for (const group of groups) {
      group.anchor = 'tag-' + slug(group.tag.name);
      for (const entry of group.operations) {
        let anchor = operationAnchor(entry.method, entry.path, entry.operation);
        while (used.has(anchor)) anchor += '-2';
        used.add(anchor);
        entry.anchor = anchor;
        entry.haystack = [entry.method, entry.path, entry.operation.summary || '', entry.operation.description || '', group.tag.name].join(' ').toLowerCase();
      }
    }
    renderHeader(spec);
    renderContents(groups);
    renderOperations(groups);
    renderProblemFields();
    const count = groups.reduce((sum, group) => sum + group.operations.length, 0);
    status.textContent = count + ' operations in ' + groups.length + ' groups.';
    status.classList.add('visually-hidden');
    byId('filter').addEventListener('input', () => applyFilter(groups));
    revisitFragment();
  }

  if (document.readyState === 'loading') {
    document.addEventListener('DOMContentLoaded', start);
  } else {
    start();
  }
})();
