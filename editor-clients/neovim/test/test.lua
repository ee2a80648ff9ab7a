-- Headless Neovim test of Plumb's language server through the client in ../plumb.lua.
--
-- Run by run.sh as: nvim --headless --clean -u NONE -c "luafile test.lua", with
--   PLUMB_JAR        the server jar (started as java -jar PLUMB_JAR lsp)
--   PLUMB_WORKSPACE  a folder with a .git marker holding pod.plumb and site.plumb (see run.sh)
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
  local function line_index(prefix)
    for i, l in ipairs(lines) do
      if l:sub(1, #prefix) == prefix then
        return i - 1
      end
    end
    fatal('fixture: no line starts with ' .. prefix)
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
