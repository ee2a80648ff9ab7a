-- Headless Neovim test of Plumb's language server through the client in ../plumb.lua.
--
-- Run by run.sh as: nvim --headless --clean -u NONE -c "luafile test.lua", with
--   PLUMB_JAR        the server jar (started as java -jar PLUMB_JAR lsp)
--   PLUMB_WORKSPACE  a folder with a .git marker holding pod.plumb, probe.plumb and site.plumb
--                    (see run.sh)
--   PLUMB_NVIM_DIR   the folder holding plumb.lua
-- Works on Neovim 0.7.2 (no vim.lsp.start, no -l). Every wait is bounded; any failure or Lua
-- error ends Neovim with exit status 1, success with 0.

local WAIT_MS = 30000

local passed, failed = 0, 0

local function out(line)
  io.stdout:write(line .. '\n')
  io.stdout:flush()
end

local function finish()
  local summary = string.format('neovim-lsp: %d passed, %d failed', passed, failed)
  out(summary)
  if failed > 0 then
    vim.cmd('cquit 1')
  else
    vim.cmd('qa!')
  end
end

-- A check that failed is reported and counted; the test goes on with the next one.
local function check(name, ok, detail)
  if ok then
    passed = passed + 1
    out('ok   ' .. name)
  else
    failed = failed + 1
    out('FAIL ' .. name .. (detail and ('\n     ' .. detail) or ''))
  end
  return ok
end

-- A failed precondition: nothing after it can run.
local FATAL = {}
local function fatal(msg)
  failed = failed + 1
  out('FAIL ' .. msg)
  error(FATAL, 0)
end

local function wait_for(what, fn)
  if not vim.wait(WAIT_MS, fn, 20) then
    fatal(string.format('timed out after %d ms waiting for %s', WAIT_MS, what))
  end
end

local function env(name)
  local v = os.getenv(name)
  if not v or v == '' then
    fatal('environment variable ' .. name .. ' is not set')
  end
  return v
end

local function show(v)
  return vim.inspect(v, { newline = ' ', indent = '' })
end

-- Byte column (0-based) of the first occurrence of `needle` in a buffer line, plus `skip` bytes.
local function col_of(line, needle, skip)
  local s = line:find(needle, 1, true)
  if not s then
    fatal(string.format('fixture: %q not found in line %q', needle, line))
  end
  return s - 1 + (skip or 0)
end

-- Length of a line in UTF-16 code units (the protocol's character count).
local function utf16_len(line)
  local _, n = vim.str_utfindex(line)
  return n
end

-- The buffer text under a one-line protocol range (UTF-16 characters turned into bytes), or nil.
local function range_text(bufnr, range)
  if range.start.line ~= range['end'].line then
    return nil
  end
  local line = vim.api.nvim_buf_get_lines(bufnr, range.start.line, range.start.line + 1, false)[1]
  if not line then
    return nil
  end
  local ok_a, a = pcall(vim.str_byteindex, line, range.start.character, true)
  local ok_b, b = pcall(vim.str_byteindex, line, range['end'].character, true)
  if not (ok_a and ok_b) then
    return nil
  end
  return line:sub(a + 1, b)
end

-- The 0-based row of the first of `lines` that starts with `prefix`.
local function row_in(lines, prefix)
  for i, l in ipairs(lines) do
    if l:sub(1, #prefix) == prefix then
      return i - 1
    end
  end
  fatal('fixture: no line starts with ' .. prefix)
end

-- The 0-based row of the first line of a buffer that starts with `prefix`.
local function row_of(bufnr, prefix)
  return row_in(vim.api.nvim_buf_get_lines(bufnr, 0, -1, false), prefix)
end

-- A request through the client; the result, or nil and a description of what came back instead.
local function request(client, method, params, bufnr)
  local r, e = client.request_sync(method, params, WAIT_MS, bufnr)
  if not r then
    return nil, method .. ': ' .. show(e)
  end
  if r.err then
    return nil, method .. ': ' .. show(r.err)
  end
  return r.result, method .. ': ' .. show(r.result)
end

local function titles_of(actions)
  local t = {}
  for _, a in ipairs(actions or {}) do
    table.insert(t, a.title)
  end
  return t
end

local function find_by(list, key, value)
  for _, x in ipairs(list or {}) do
    if x[key] == value then
      return x
    end
  end
  return nil
end

-- (7)-(16) The remaining features, on probe.plumb (see run.sh), opened beside pod.plumb; site.plumb
-- is open too since the jump to its definition in (3).
local function probe_checks(client, published, ws)
  local probe = ws .. '/probe.plumb'
  local site = ws .. '/site.plumb'
  vim.cmd('hide edit ' .. vim.fn.fnameescape(probe))
  local buf = vim.api.nvim_get_current_buf()
  local uri = vim.uri_from_bufnr(buf)
  wait_for('probe.plumb to attach to the running server', function()
    return vim.lsp.buf_is_attached(buf, client.id)
  end)
  local original = vim.api.nvim_buf_get_lines(buf, 0, -1, false)
  local function line(row)
    return vim.api.nvim_buf_get_lines(buf, row, row + 1, false)[1]
  end
  -- The diagnostics published for the buffer's current version (nil until they arrive).
  local function current_diags()
    local p = published[uri]
    if not p or p.version ~= vim.lsp.util.buf_versions[buf] then
      return nil
    end
    return p.diagnostics
  end
  local function unknown_unit()
    return find_by(current_diags(), 'code', 'unit.unknown')
  end

  local air = row_of(buf, 'section "Air"')
  local bead = row_of(buf, 'section "Bead"')
  local drag = row_of(buf, 'section "Drag"')
  local last = #original - 1
  local rho_row = row_of(buf, 'input ρ_air')
  local mu_row = row_of(buf, 'input µ_air')
  local d_row = row_of(buf, 'input d_bead')
  local h_row = row_of(buf, 'input h_mount')
  local re_row = row_of(buf, 'Re_bead')
  local cd_row = row_of(buf, 'Cd_s')
  local a_row = row_of(buf, 'A_bead')
  local f_row = row_of(buf, 'F_bead')

  -- (7) The typo'd unit is the calc's one mistake; the check on h_mount says it was not evaluated.
  wait_for('diagnostics for probe.plumb', function()
    return current_diags() ~= nil
  end)
  local typo = unknown_unit()
  local others = {}
  for _, d in ipairs(current_diags()) do
    if d.code ~= 'unit.unknown' then table.insert(others, d.code) end
  end
  check('probe.plumb: unit.unknown on the h_mount line, under "mtr", and the check on it not evaluated',
    typo ~= nil and #current_diags() == 2 and typo.range.start.line == h_row and range_text(buf, typo.range) == 'mtr'
      and #others == 1 and others[1] == 'check.not-evaluated',
    show(current_diags()))

  -- (8) Document symbols: the sections at the top, their definitions and checks as children.
  local syms, serr = request(client, 'textDocument/documentSymbol', { textDocument = { uri = uri } }, buf)
  local outline = {}
  for _, s in ipairs(syms or {}) do
    local kids = {}
    for _, c in ipairs(s.children or {}) do
      table.insert(kids, c.name)
    end
    table.insert(outline, { s.name, s.kind, kids })
  end
  local NS = vim.lsp.protocol.SymbolKind.Namespace
  local want_outline = {
    { 'Air', NS, { 'ρ_air', 'µ_air' } },
    { 'Bead', NS, { 'd_bead', 'h_mount', 'check h_mount < 4 m' } },
    { 'Drag', NS, { 'Re_bead', 'Cd_s', 'A_bead', 'q_bead', 'F_bead' } },
  }
  check('documentSymbol: sections Air, Bead, Drag (Namespace) with their definitions as children',
    vim.deep_equal(outline, want_outline), show(outline) .. (syms and '' or ' ' .. serr))
  local air_sym = syms and syms[1]
  if air_sym then
    check('documentSymbol: the Air section spans its line to its last definition',
      air_sym.range.start.line == air and air_sym.range['end'].line == mu_row, show(air_sym.range))
    local mu = find_by(air_sym.children, 'name', 'µ_air')
    check('documentSymbol: µ_air is a Constant whose selection range covers its name (UTF-16)',
      mu ~= nil and mu.kind == vim.lsp.protocol.SymbolKind.Constant and mu.selectionRange.start.line == mu_row
        and range_text(buf, mu.selectionRange) == 'µ_air', show(mu))
  end

  -- (9) Folding ranges: each section from its line to the line before the next; the last to the end.
  local folds, ferr = request(client, 'textDocument/foldingRange', { textDocument = { uri = uri } }, buf)
  local got_folds = {}
  for _, f in ipairs(folds or {}) do
    table.insert(got_folds, { f.startLine, f.endLine })
  end
  table.sort(got_folds, function(x, y)
    return x[1] < y[1]
  end)
  local want_folds = { { air, bead - 1 }, { bead, drag - 1 }, { drag, last } }
  check(string.format('foldingRange: sections fold %d-%d, %d-%d, %d-%d', air, bead - 1, bead, drag - 1, drag, last),
    vim.deep_equal(got_folds, want_folds), show(got_folds) .. (folds and '' or ' ' .. ferr))

  -- (10) Semantic tokens (Neovim 0.7 does not show them; only the answer is checked).
  local toks, terr = request(client, 'textDocument/semanticTokens/full', { textDocument = { uri = uri } }, buf)
  local data = toks and toks.data or {}
  check('semanticTokens/full: a non-empty data array, a multiple of 5 long',
    #data > 0 and #data % 5 == 0, #data .. ' numbers; ' .. (toks and '' or terr))
  local legend = (client.server_capabilities.semanticTokensProvider or {}).legend or {}
  local types = legend.tokenTypes or {}
  local decoded, bad = {}, {}
  local row, col = 0, 0
  for i = 1, #data - 4, 5 do
    if data[i] > 0 then
      col = 0
    end
    row = row + data[i]
    col = col + data[i + 1]
    local range = { start = { line = row, character = col }, ['end'] = { line = row, character = col + data[i + 2] } }
    local t = range_text(buf, range)
    local kind = types[data[i + 3] + 1]
    if data[i] < 0 or data[i + 1] < 0 or data[i + 2] <= 0 or not t or t == '' or not kind then
      table.insert(bad, show({ data[i], data[i + 1], data[i + 2], data[i + 3], data[i + 4] }))
    else
      decoded[row .. ':' .. t] = kind
    end
  end
  check('semanticTokens/full: every token decodes to buffer text and a legend type', #bad == 0 and #data > 0,
    table.concat(bad, ', '))
  local want_tokens = {
    [rho_row .. ':kg/m³'] = 'type',
    [mu_row .. ':µPa*s'] = 'type',
    [re_row .. ':ρ_air'] = 'parameter',
    [re_row .. ':V_rig'] = 'parameter',
    [re_row .. ':µ_air'] = 'parameter',
    [cd_row .. ':cd_sphere_sn'] = 'function',
    [cd_row .. ':Re_bead'] = 'variable',
    [a_row .. ':mm^2'] = 'type',
  }
  local got_tokens = {}
  for k in pairs(want_tokens) do
    got_tokens[k] = decoded[k]
  end
  check('semanticTokens/full: inputs, values, the correlation and units at their UTF-16 places',
    vim.deep_equal(got_tokens, want_tokens), show(got_tokens))

  -- (11) Workspace symbols over the open documents (probe.plumb, pod.plumb, site.plumb).
  local ws_syms, werr = request(client, 'workspace/symbol', { query = 're_b' }, buf)
  local names = {}
  for _, s in ipairs(ws_syms or {}) do
    table.insert(names, s.name)
  end
  local re_sym = ws_syms and ws_syms[1]
  check('workspace/symbol "re_b" finds Re_bead alone, at its name in probe.plumb',
    vim.deep_equal(names, { 'Re_bead' }) and re_sym.location.uri == uri and re_sym.location.range.start.line == re_row
      and range_text(buf, re_sym.location.range) == 'Re_bead', show(ws_syms) .. (ws_syms and '' or ' ' .. werr))
  ws_syms, werr = request(client, 'workspace/symbol', { query = 'V_RIG' }, buf)
  local v_sym = ws_syms and ws_syms[1]
  check('workspace/symbol "V_RIG" finds V_rig in site.plumb (line 1, 6..11)',
    ws_syms ~= nil and #ws_syms == 1 and v_sym.name == 'V_rig' and v_sym.location.uri == vim.uri_from_fname(site)
      and vim.deep_equal(v_sym.location.range,
        { start = { line = 1, character = 6 }, ['end'] = { line = 1, character = 11 } }),
    show(ws_syms) .. (ws_syms and '' or ' ' .. werr))

  -- (12) Signature help inside the call of a library correlation.
  local cd_line = line(cd_row)
  local open_paren = utf16_len(cd_line:sub(1, col_of(cd_line, 'cd_sphere_sn(', #'cd_sphere_sn(')))
  local help, herr = request(client, 'textDocument/signatureHelp',
    { textDocument = { uri = uri }, position = { line = cd_row, character = open_paren } }, buf)
  local sig = help and help.signatures and help.signatures[1]
  check('signatureHelp in cd_sphere_sn( reads "cd_sphere_sn(Re: dimensionless)"',
    sig ~= nil and sig.label == 'cd_sphere_sn(Re: dimensionless)', show(help) .. (help and '' or ' ' .. herr))
  if sig then
    local docs = type(sig.documentation) == 'table' and sig.documentation.value or tostring(sig.documentation)
    check('signatureHelp: parameter "Re: dimensionless" is active, the docs give the valid range',
      help.activeParameter == 0 and sig.parameters and sig.parameters[1]
        and sig.parameters[1].label == 'Re: dimensionless'
        and docs:find('valid:', 1, true) ~= nil, show(help))
  end

  -- (13) References and highlights of d_bead, asked for from its use after ρ_air on the Re line.
  local re_line = line(re_row)
  vim.api.nvim_win_set_cursor(0, { re_row + 1, col_of(re_line, 'd_bead', 2) })
  local pos = vim.lsp.util.make_position_params(0, client.offset_encoding)
  local d_char = utf16_len(re_line:sub(1, col_of(re_line, 'd_bead'))) + 2
  check('cursor on d_bead after ρ_air is sent as UTF-16 character ' .. d_char, pos.position.character == d_char,
    show(pos.position))
  local want_rows = { d_row, re_row, a_row }
  local function rows_and_texts(ranges)
    local rows, texts = {}, {}
    for _, r in ipairs(ranges) do
      table.insert(rows, r.start.line)
      texts[range_text(buf, r) or '?'] = true
    end
    table.sort(rows)
    return rows, texts
  end
  local ref_params = vim.tbl_extend('force', pos, { context = { includeDeclaration = true } })
  local refs, rerr = request(client, 'textDocument/references', ref_params, buf)
  local ranges, uris = {}, {}
  for _, l in ipairs(refs or {}) do
    table.insert(ranges, l.range)
    uris[l.uri] = true
  end
  local rows, texts = rows_and_texts(ranges)
  check('references of d_bead: its definition and both uses, in probe.plumb, each covering "d_bead"',
    vim.deep_equal(rows, want_rows) and vim.deep_equal(texts, { d_bead = true })
      and vim.deep_equal(uris, { [uri] = true }),
    show(refs) .. (refs and '' or ' ' .. rerr))
  local his, hierr = request(client, 'textDocument/documentHighlight', pos, buf)
  ranges = {}
  for _, h in ipairs(his or {}) do
    table.insert(ranges, h.range)
  end
  rows, texts = rows_and_texts(ranges)
  check('documentHighlight of d_bead: the same three places', vim.deep_equal(rows, want_rows)
    and vim.deep_equal(texts, { d_bead = true }), show(his) .. (his and '' or ' ' .. hierr))

  -- The editor's own commands: the quickfix list and the reference highlights, in byte columns.
  vim.fn.setqflist({}, 'r')
  vim.lsp.buf.references()
  local listed = vim.wait(WAIT_MS, function()
    return #vim.fn.getqflist() == 3
  end, 20)
  local qf = {}
  for _, item in ipairs(vim.fn.getqflist()) do
    local l = vim.api.nvim_buf_get_lines(item.bufnr, item.lnum - 1, item.lnum, false)[1] or ''
    table.insert(qf, { item.lnum - 1, l:sub(item.col, item.col + #'d_bead' - 1) })
  end
  check('vim.lsp.buf.references() lists the three places of d_bead in the quickfix list',
    listed and vim.deep_equal(qf, { { d_row, 'd_bead' }, { re_row, 'd_bead' }, { a_row, 'd_bead' } }), show(qf))
  vim.cmd('cclose')
  vim.api.nvim_set_current_buf(buf)
  vim.api.nvim_win_set_cursor(0, { re_row + 1, col_of(re_line, 'd_bead', 2) })
  local ref_ns = vim.api.nvim_create_namespace('vim_lsp_references')
  vim.lsp.buf.document_highlight()
  local marked = {}
  local lit = vim.wait(WAIT_MS, function()
    marked = {}
    for _, m in ipairs(vim.api.nvim_buf_get_extmarks(buf, ref_ns, 0, -1, { details = true })) do
      local l = line(m[2])
      table.insert(marked, { m[2], l:sub(m[3] + 1, m[4].end_col) })
    end
    return #marked == 3
  end, 20)
  table.sort(marked, function(x, y)
    return x[1] < y[1]
  end)
  check('vim.lsp.buf.document_highlight() marks "d_bead" at the three places',
    lit and vim.deep_equal(marked, { { d_row, 'd_bead' }, { re_row, 'd_bead' }, { a_row, 'd_bead' } }), show(marked))
  vim.lsp.buf.clear_references()

  -- (14) Completion on lines typed at the end of the calc, asked for at the end of each.
  vim.api.nvim_buf_set_lines(buf, -1, -1, false, { 'z = 12 k' })
  local z_row = #original
  local items, cerr = request(client, 'textDocument/completion',
    { textDocument = { uri = uri }, position = { line = z_row, character = utf16_len(line(z_row)) } }, buf)
  items = items and (items.items or items) or {}
  local kn = find_by(items, 'label', 'kN')
  local not_units = {}
  for _, it in ipairs(items) do
    if it.kind ~= vim.lsp.protocol.CompletionItemKind.Unit or it.label:sub(1, 1) ~= 'k' then
      table.insert(not_units, it.label)
    end
  end
  check('completion after "z = 12 k" offers the unit kN', kn ~= nil, show(titles_of(items)) .. ' ' .. tostring(cerr))
  check('completion after "z = 12 k" offers only units starting with k', #items > 0 and #not_units == 0,
    show(not_units))
  vim.api.nvim_buf_set_lines(buf, z_row, z_row + 1, false, { 'z = ρ_a' })
  items, cerr = request(client, 'textDocument/completion',
    { textDocument = { uri = uri }, position = { line = z_row, character = utf16_len(line(z_row)) } }, buf)
  items = items and (items.items or items) or {}
  local rho = find_by(items, 'label', 'ρ_air')
  local labels = {}
  for _, it in ipairs(items) do
    table.insert(labels, it.label)
  end
  check('completion at "z = ρ_a" offers ρ_air with its value "1.18 kg/m³" as detail (and nothing else)',
    rho ~= nil and rho.detail == '1.18 kg/m³' and vim.deep_equal(labels, { 'ρ_air' }),
    show(rho) .. ' among ' .. show(labels) .. ' ' .. tostring(cerr))
  vim.api.nvim_buf_set_lines(buf, z_row, z_row + 1, false, {})
  check('the typed line is removed again', vim.deep_equal(vim.api.nvim_buf_get_lines(buf, 0, -1, false), original))

  -- (15) Code actions: the quick fix for the typo, applied; the SI refactor, through the editor.
  wait_for('the unit.unknown diagnostic of the restored text', unknown_unit)
  typo = unknown_unit()
  local actions, aerr = request(client, 'textDocument/codeAction',
    { textDocument = { uri = uri }, range = typo.range, context = { diagnostics = { typo } } }, buf)
  local fix = find_by(actions, 'title', "Change to 'm' (metre, a length)")
  check([[codeAction on "3 mtr" offers the quick fix "Change to 'm' (metre, a length)"]], fix ~= nil and fix.kind == 'quickfix',
    show(titles_of(actions)) .. (actions and '' or ' ' .. aerr))
  if fix then
    local edits = fix.edit and fix.edit.changes and fix.edit.changes[uri]
    check('the fix replaces exactly "mtr" by "m"',
      edits ~= nil and #edits == 1 and edits[1].newText == 'm' and vim.deep_equal(edits[1].range, typo.range),
      show(fix.edit))
    vim.lsp.util.apply_workspace_edit(fix.edit, 'utf-16')
    check('applying the fix gives "input h_mount = 3 m"', line(h_row) == 'input h_mount = 3 m', show(line(h_row)))
    wait_for('diagnostics of the fixed text', function()
      return current_diags() ~= nil
    end)
    check('after the fix the server publishes no diagnostics for probe.plumb', #current_diags() == 0,
      show(current_diags()))
    check('vim.diagnostic is empty for probe.plumb', #vim.diagnostic.get(buf) == 0, show(vim.diagnostic.get(buf)))
  end

  vim.api.nvim_win_set_cursor(0, { f_row + 1, 0 })
  local rparams = vim.lsp.util.make_range_params(0, client.offset_encoding)
  rparams.context = { diagnostics = {} }
  actions, aerr = request(client, 'textDocument/codeAction', rparams, buf)
  local si = find_by(actions, 'title', 'Show F_bead in SI (N)')
  check('codeAction on the F_bead line offers the refactor "Show F_bead in SI (N)"',
    si ~= nil and si.kind == 'refactor.rewrite', show(titles_of(actions)) .. (actions and '' or ' ' .. aerr))
  -- vim.lsp.buf.code_action() asks through vim.ui.select: pick the SI action there.
  local offered
  local select = vim.ui.select
  vim.ui.select = function(choices, opts, on_choice)
    offered = {}
    local pick
    for _, c in ipairs(choices) do
      local title = opts.format_item(c)
      table.insert(offered, title)
      if title == 'Show F_bead in SI (N)' then
        pick = c
      end
    end
    on_choice(pick)
  end
  vim.lsp.buf.code_action()
  local want_f = 'F_bead  = Cd_s * A_bead * q_bead  in N'
  local applied = vim.wait(WAIT_MS, function()
    return line(f_row) == want_f
  end, 20)
  vim.ui.select = select
  check('vim.lsp.buf.code_action() applies "Show F_bead in SI (N)": ' .. want_f, applied,
    show(line(f_row)) .. ' offered ' .. show(offered))

  -- (16) Formatting lines up the misaligned Air block and nothing else; a second run changes nothing.
  local fmt_params = vim.lsp.util.make_formatting_params({ tabSize = 4, insertSpaces = true })
  local edits, fe = request(client, 'textDocument/formatting', fmt_params, buf)
  local outside = {}
  for _, e in ipairs(edits or {}) do
    if e.range.start.line < rho_row or e.range['end'].line > mu_row then
      table.insert(outside, e)
    end
  end
  check('formatting edits only the two lines of the Air block', edits ~= nil and #edits > 0 and #outside == 0,
    show(edits) .. (edits and '' or ' ' .. fe))
  vim.lsp.util.apply_text_edits(edits or {}, buf, 'utf-16')
  local want_lines = vim.deepcopy(original)
  want_lines[rho_row + 1] = 'input ρ_air = 1.18 kg/m³  "air in the rig hall"'
  want_lines[mu_row + 1] = 'input µ_air = 18.2 µPa*s  "dynamic viscosity at 22 °C"'
  want_lines[h_row + 1] = 'input h_mount = 3 m'
  want_lines[f_row + 1] = want_f
  local now = vim.api.nvim_buf_get_lines(buf, 0, -1, false)
  local diff = {}
  for i = 1, math.max(#now, #want_lines) do
    if now[i] ~= want_lines[i] then
      table.insert(diff, string.format('line %d: got %s, want %s', i - 1, show(now[i]), show(want_lines[i])))
    end
  end
  check('after formatting the = signs and notes of the Air block line up; every other line is unchanged',
    #diff == 0, table.concat(diff, '; '))
  edits, fe = request(client, 'textDocument/formatting', fmt_params, buf)
  check('formatting the formatted calc changes nothing', edits ~= nil and #edits == 0, show(edits) .. ' ' .. fe)
end

local function read_file(path)
  local f = io.open(path, 'rb')
  if not f then
    return nil
  end
  local text = f:read('*a')
  f:close()
  return text
end

-- (17) :PlumbReport on pod.plumb: the report of the buffer as it is, an unsaved edit of the
-- title included, beside the calc; said where it is, and opened where Neovim can open files.
local function report_checks(buf, ws)
  vim.api.nvim_set_current_buf(buf)
  local title_row = row_of(buf, 'title ')
  local title_line = vim.api.nvim_buf_get_lines(buf, title_row, title_row + 1, false)[1]
  local at = col_of(title_line, 'Camera pod', #'Camera pod')
  vim.api.nvim_buf_set_text(buf, title_row, at, title_row, at, { ' (unsaved)' })
  local report = ws .. '/pod.html'
  local notes = {}
  local notify, open = vim.notify, vim.ui.open
  vim.notify = function(msg, level)
    table.insert(notes, { tostring(msg), level })
  end
  -- As on Neovim before 0.10, which has no vim.ui.open: the path is said, not opened.
  vim.ui.open = nil
  vim.cmd('PlumbReport')
  vim.wait(WAIT_MS, function()
    return #notes > 0
  end, 20)
  check(':PlumbReport says it wrote the report beside pod.plumb',
    vim.deep_equal(notes, { { 'plumb: Wrote the report of pod.plumb beside it: ' .. report, vim.log.levels.INFO } }),
    show(notes))
  local html = read_file(report) or ''
  local want_title = '<title>Camera pod (unsaved) in a rig air stream: drag (editor test, invented data)</title>'
  check('pod.html holds the title as typed in the buffer', html:find(want_title, 1, true) ~= nil, html:sub(1, 400))
  check('pod.plumb on disk still has the saved title (the report came from the buffer)',
    (read_file(ws .. '/pod.plumb') or ''):find('"Camera pod in a rig', 1, true) ~= nil)

  local opened
  vim.ui.open = function(path)
    opened = path
    return nil, nil
  end
  vim.cmd('PlumbReport')
  vim.wait(WAIT_MS, function()
    return opened ~= nil
  end, 20)
  check(':PlumbReport opens the report with vim.ui.open where Neovim has it', opened == report, show(opened))

  notes = {}
  vim.cmd('enew')
  vim.cmd('PlumbReport')
  check(':PlumbReport in a buffer that is not a calc says so',
    vim.deep_equal(notes, { { 'plumb: this buffer is not a calc that Plumb serves (open a .plumb file)',
      vim.log.levels.ERROR } }), show(notes))
  vim.notify, vim.ui.open = notify, open
end

local function run()
  local jar = env('PLUMB_JAR')
  local ws = env('PLUMB_WORKSPACE')
  package.path = env('PLUMB_NVIM_DIR') .. '/?.lua;' .. package.path

  -- Every publishDiagnostics as the server sent it (protocol ranges, UTF-16), by URI.
  local published = {}
  local plumb = require('plumb')
  plumb.setup({
    cmd = { 'java', '-jar', jar, 'lsp' },
    handlers = {
      ['textDocument/publishDiagnostics'] = function(err, result, ctx, config)
        published[result.uri] = result
        return vim.lsp.diagnostic.on_publish_diagnostics(err, result, ctx, config)
      end,
    },
  })

  local pod = ws .. '/pod.plumb'
  local site = ws .. '/site.plumb'
  vim.cmd('edit ' .. vim.fn.fnameescape(pod))
  local buf = vim.api.nvim_get_current_buf()
  local uri = vim.uri_from_bufnr(buf)

  -- The client from plumb.lua: started for the .git root, attached by the FileType autocommand.
  check('filetype is set to plumb', vim.bo[buf].filetype == 'plumb', 'filetype=' .. vim.bo[buf].filetype)
  local client
  wait_for('the plumb client to attach', function()
    local _, c = next(vim.lsp.buf_get_clients(buf))
    client = c
    return client ~= nil and client.initialized
  end)
  check('client root_dir is the workspace', client.config.root_dir == ws, tostring(client.config.root_dir))
  check('position encoding is utf-16', client.offset_encoding == 'utf-16', tostring(client.offset_encoding))

  local lines = vim.api.nvim_buf_get_lines(buf, 0, -1, false)
  -- Rows as the buffer was first read (the rename below changes the text, not these rows).
  local function line_index(prefix)
    return row_in(lines, prefix)
  end
  local function diag_ready(code)
    local p = published[uri]
    if not p or p.version ~= vim.lsp.util.buf_versions[buf] then
      return false
    end
    for _, d in ipairs(p.diagnostics) do
      if d.code == code then
        return d
      end
    end
    return code == nil
  end

  -- (1) The unit mismatch after non-ASCII names on its line, in protocol and in editor columns.
  wait_for('a unit.mismatch diagnostic for pod.plumb', function()
    return diag_ready('unit.mismatch')
  end)
  local err_line = line_index('𝑥_Δ')
  local text = lines[err_line + 1]
  local d = diag_ready('unit.mismatch')
  -- '𝑥_Δ = ' is 7 UTF-16 units (𝑥 is a surrogate pair); 'ρ_air + 40 µm' is 13 more.
  local want_range = { start = { line = err_line, character = 7 }, ['end'] = { line = err_line, character = 20 } }
  check('unit.mismatch protocol range is UTF-16 (line ' .. err_line .. ', 7..20)',
    vim.deep_equal(d.range, want_range), 'got ' .. show(d.range) .. ', want ' .. show(want_range))
  check('unit.mismatch severity is Error', d.severity == 1, tostring(d.severity))
  check('unit.mismatch source is plumb', d.source == 'plumb', tostring(d.source))
  local others = {}
  for _, x in ipairs(published[uri].diagnostics) do
    if x.code ~= 'unit.mismatch' then
      table.insert(others, x.code .. ' ' .. x.message)
    end
  end
  check('no other diagnostics (values go to code lenses, not hint diagnostics)', #others == 0, show(others))

  local vd
  for _, x in ipairs(vim.diagnostic.get(buf)) do
    if x.code == 'unit.mismatch' then
      vd = x
    end
  end
  local start_byte = col_of(text, 'ρ_air')
  local end_byte = col_of(text, 'µm', #'µm')
  check('vim.diagnostic has the unit.mismatch', vd ~= nil, show(vim.diagnostic.get(buf)))
  if vd then
    check(string.format('vim.diagnostic byte columns %d..%d on line %d', start_byte, end_byte, err_line),
      vd.lnum == err_line and vd.col == start_byte and vd.end_lnum == err_line and vd.end_col == end_byte,
      string.format('got lnum=%s col=%s end_lnum=%s end_col=%s', vd.lnum, vd.col, vd.end_lnum, vd.end_col))
    check('the diagnostic covers the sum in the buffer text',
      text:sub(vd.col + 1, vd.end_col) == 'ρ_air + 40 µm', text:sub(vd.col + 1, vd.end_col))
  end

  -- (2) Hover: the value of a name under the cursor, with the cursor placed after non-ASCII text.
  local function hover_at(row, bytecol)
    vim.api.nvim_win_set_cursor(0, { row + 1, bytecol })
    local params = vim.lsp.util.make_position_params(0, client.offset_encoding)
    local r, e = client.request_sync('textDocument/hover', params, WAIT_MS, buf)
    if not r or r.err or not r.result then
      return nil, show(e or (r and (r.err or r.result)))
    end
    local c = r.result.contents
    return type(c) == 'table' and (c.value or show(c)) or tostring(c), nil
  end
  local f_line = line_index('F = ')
  local md, e = hover_at(f_line, col_of(lines[f_line + 1], '* q', 2))
  check('hover on q shows its value', md and md:find('**q** = 191.2 Pa', 1, true), md or e)
  md, e = hover_at(err_line, col_of(text, 'ρ_air', 3))
  check('hover on ρ_air after 𝑥_Δ shows its value', md and md:find('**ρ_air** = 1.18 kg/m³', 1, true), md or e)

  -- (3) Go to definition, into the used file.
  local q_line = line_index('q = ')
  local v_col = col_of(lines[q_line + 1], 'V_rig', 2)
  vim.api.nvim_win_set_cursor(0, { q_line + 1, v_col })
  local params = vim.lsp.util.make_position_params(0, client.offset_encoding)
  check('cursor on V_rig is sent as UTF-16 character ' .. (v_col - 1),
    params.position.character == v_col - 1, show(params.position))
  local r, derr = client.request_sync('textDocument/definition', params, WAIT_MS, buf)
  local loc = r and r.result and (r.result[1] or r.result)
  if check('definition of V_rig answers one location', loc ~= nil and loc.uri ~= nil, show(r or derr)) then
    local target_uri = loc.uri or loc.targetUri
    local range = loc.range or loc.targetSelectionRange
    check('definition is in site.plumb', target_uri == vim.uri_from_fname(site), target_uri)
    check('definition range is line 1, characters 6..11',
      vim.deep_equal(range, { start = { line = 1, character = 6 }, ['end'] = { line = 1, character = 11 } }),
      show(range))
  end
  -- The editor's own jump (vim.lsp.buf.definition) opens site.plumb at the name.
  vim.lsp.buf.definition()
  local jumped = vim.wait(WAIT_MS, function()
    return vim.api.nvim_buf_get_name(0) == site
  end, 20)
  check('vim.lsp.buf.definition() opens site.plumb', jumped, vim.api.nvim_buf_get_name(0))
  if jumped then
    local cur = vim.api.nvim_win_get_cursor(0)
    check('cursor lands on V_rig in site.plumb (row 2, col 6)', cur[1] == 2 and cur[2] == 6, show(cur))
    check('site.plumb is attached to the same server',
      vim.lsp.buf_is_attached(vim.api.nvim_get_current_buf(), client.id))
    vim.api.nvim_set_current_buf(buf)
  end

  -- (4) Code lenses: asked for directly, then as the editor shows them.
  local function lens_titles(result)
    local t = {}
    for _, l in ipairs(result or {}) do
      t[l.range.start.line] = l.command and l.command.title
    end
    return t
  end
  r = client.request_sync('textDocument/codeLens', { textDocument = { uri = uri } }, WAIT_MS, buf)
  local titles = lens_titles(r and r.result)
  check('code lens on the q line reads "q = 191.2 Pa"', titles[q_line] == 'q = 191.2 Pa', show(titles))
  check('code lens on the F line reads "F = 1.588 N"', titles[f_line] == 'F = 1.588 N', show(titles))
  check('code lens on the A line reads "A = 0.01767 m²"', titles[line_index('A = ')] == 'A = 0.01767 m²', show(titles))
  -- The line with the error has no value: its lens says so, as `plumb eval` does.
  check('code lens on the line with the error reads "𝑥_Δ = ?"', titles[err_line] == '𝑥_Δ = ?', show(titles))

  local ns = vim.lsp.codelens.__namespaces[client.id]
  local function shown(row)
    local marks = vim.api.nvim_buf_get_extmarks(buf, ns, { row, 0 }, { row, -1 }, { details = true })
    local s = {}
    for _, m in ipairs(marks) do
      for _, chunk in ipairs(m[4].virt_text or {}) do
        table.insert(s, chunk[1])
      end
    end
    return table.concat(s)
  end
  vim.lsp.codelens.refresh()
  local displayed = vim.wait(WAIT_MS, function()
    return shown(q_line) == 'q = 191.2 Pa'
  end, 20)
  check('Neovim displays the q lens as virtual text', displayed, show(shown(q_line)))
  -- Running a lens (it only shows a value) warns about nothing and leaves the value shown.
  vim.wait(300) -- let the display of earlier lens answers settle first
  local notes = {}
  local notify = vim.notify
  vim.notify = function(msg, level)
    table.insert(notes, tostring(msg))
    return notify(msg, level)
  end
  vim.api.nvim_win_set_cursor(0, { q_line + 1, 0 })
  vim.lsp.codelens.run()
  local back = vim.wait(WAIT_MS, function()
    return shown(q_line) == 'q = 191.2 Pa'
  end, 20)
  vim.wait(200)
  vim.notify = notify
  check('vim.lsp.codelens.run() on the q line gives no warning', #notes == 0, show(notes))
  check('the q lens is shown again after running it', back, show(shown(q_line)))

  -- (5) Edits: incremental changes after non-ASCII text move, then clear, the mismatch.
  -- Insert a second Δ after the first one: the sum now starts at UTF-16 character 8.
  vim.api.nvim_buf_set_text(buf, err_line, col_of(text, 'Δ', #'Δ'), err_line, col_of(text, 'Δ', #'Δ'), { 'Δ' })
  wait_for('diagnostics for the edited version', function()
    return diag_ready('unit.mismatch')
  end)
  d = diag_ready('unit.mismatch')
  check('after inserting Δ the mismatch starts at UTF-16 character 8',
    d.range.start.character == 8 and d.range['end'].character == 21, show(d.range))
  -- Replace '40 µm' with '0.2 kg/m³': the sum is now a density and the error goes away.
  text = vim.api.nvim_buf_get_lines(buf, err_line, err_line + 1, false)[1]
  local a = col_of(text, '40 µm')
  vim.api.nvim_buf_set_text(buf, err_line, a, err_line, a + #'40 µm', { '0.2 kg/m³' })
  wait_for('diagnostics after the fix', function()
    return diag_ready(nil) and #published[uri].diagnostics == 0
  end)
  check('fixing the unit clears every diagnostic', #vim.diagnostic.get(buf) == 0, show(vim.diagnostic.get(buf)))
  -- The server asks for a code lens refresh; plumb.lua's handler fetches and shows the new lens.
  local fixed = vim.wait(WAIT_MS, function()
    return shown(err_line) == '𝑥_ΔΔ = 1.38 kg/m³'
  end, 20)
  check('the fixed line gets its lens "𝑥_ΔΔ = 1.38 kg/m³" without a manual refresh', fixed, show(shown(err_line)))
  md, e = hover_at(err_line, col_of(vim.api.nvim_buf_get_lines(buf, err_line, err_line + 1, false)[1], 'ρ_air', 1))
  check('hover on ρ_air still works after the edits', md and md:find('**ρ_air** = 1.18 kg/m³', 1, true), md or e)

  -- (6) Rename from a use after the surrogate pair: Neovim applies the server's UTF-16 edits.
  text = vim.api.nvim_buf_get_lines(buf, err_line, err_line + 1, false)[1]
  vim.api.nvim_win_set_cursor(0, { err_line + 1, col_of(text, 'ρ_air', 2) })
  vim.lsp.buf.rename('ρ_luft')
  local renamed = vim.wait(WAIT_MS, function()
    return vim.api.nvim_buf_get_lines(buf, err_line, err_line + 1, false)[1]:find('ρ_luft', 1, true) ~= nil
  end, 20)
  local want = {
    [line_index('input ρ_air')] = 'input ρ_luft = 1.18 kg/m³   "air in the rig hall"',
    [q_line] = 'q = 0.5 * ρ_luft * V_rig^2   in Pa',
    [err_line] = '𝑥_ΔΔ = ρ_luft + 0.2 kg/m³   "gap at 22 °C"',
  }
  local got = {}
  for row in pairs(want) do
    got[row] = vim.api.nvim_buf_get_lines(buf, row, row + 1, false)[1]
  end
  check('rename ρ_air → ρ_luft edits the definition and both uses exactly', renamed and vim.deep_equal(got, want),
    show(got))

  probe_checks(client, published, ws)
  report_checks(buf, ws)

  -- Shut the server down cleanly.
  vim.lsp.stop_client(client.id)
  local stopped = vim.wait(10000, function()
    return client.is_stopped()
  end, 50)
  check('the server stops on shutdown/exit', stopped)
end

local ok, err = xpcall(run, debug.traceback)
if not ok and err ~= FATAL then
  failed = failed + 1
  out('FAIL Lua error: ' .. tostring(err))
end
finish()
