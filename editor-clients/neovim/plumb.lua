-- Plumb language server client for Neovim 0.7 and later.
--
-- Registers `plumb lsp` for *.plumb files with the built-in LSP client, using only calls that
-- Neovim 0.7 already has (vim.lsp.start_client + vim.lsp.buf_attach_client), so it needs no
-- plugin. One server runs per project root (the nearest folder above the file holding
-- plumb.toml or .git; the file's own folder when there is none).
--
-- Usage (init.lua):
--   package.path = package.path .. ';/path/to/plumb/editor-clients/neovim/?.lua'
--   require('plumb').setup({ cmd = { 'plumb', 'lsp' } })
-- See README.md beside this file for the options. :PlumbReport writes the printable report of
-- the calc in the current buffer (the server's command plumb.writeReport) and opens it.

local M = {}

local defaults = {
  -- The command that starts the server; `plumb` must be on PATH, or name the jar:
  -- { 'java', '-jar', '/path/to/plumb.jar', 'lsp' }.
  cmd = { 'plumb', 'lsp' },
  -- Files or folders whose presence marks a project root, searched upwards from the file.
  root_markers = { 'plumb.toml', '.git' },
  -- Sent as initializationOptions, e.g. { significantFigures = 5, debounceMs = 200 }.
  init_options = nil,
  -- Values on code lenses above each line (Neovim 0.7 shows code lenses, not inlay hints).
  -- false: the server sends values as hint diagnostics instead.
  code_lens = true,
  -- Called as on_attach(client, bufnr) after the buffer is attached; for key maps.
  on_attach = nil,
  -- Extra handlers merged into the client's handlers (e.g. to watch publishDiagnostics).
  handlers = nil,
  -- Milliseconds Neovim waits for the server to exit when it quits.
  exit_timeout = 2000,
}

M.config = vim.deepcopy(defaults)

-- One client id per root folder.
local clients = {}

--- The capabilities Neovim announces, plus code lens: Neovim 0.7 displays code lenses
--- (vim.lsp.codelens) but does not say so in its default capabilities, and the server picks
--- the channel for values from what the client announces.
function M.capabilities()
  local caps = vim.lsp.protocol.make_client_capabilities()
  if M.config.code_lens then
    caps.textDocument.codeLens = caps.textDocument.codeLens or { dynamicRegistration = false }
    caps.workspace = caps.workspace or {}
    caps.workspace.codeLens = { refreshSupport = true }
  end
  return caps
end

--- The nearest folder at or above `path` that holds one of the root markers.
function M.root_dir(path)
  local dir = vim.fn.fnamemodify(path, ':p:h')
  local start = dir
  while true do
    for _, marker in ipairs(M.config.root_markers) do
      if vim.loop.fs_stat(dir .. '/' .. marker) then
        return dir
      end
    end
    local parent = vim.fn.fnamemodify(dir, ':h')
    if parent == dir then
      return start
    end
    dir = parent
  end
end

--- Asks the server for the code lenses of one buffer and shows them.
function M.refresh_code_lens(bufnr)
  if not M.config.code_lens or not vim.api.nvim_buf_is_loaded(bufnr) then
    return
  end
  local params = { textDocument = { uri = vim.uri_from_bufnr(bufnr) } }
  vim.lsp.buf_request(bufnr, 'textDocument/codeLens', params, vim.lsp.codelens.on_codelens)
end

local function handlers()
  local h = {
    -- The server asks for a refresh whenever a new analysis is published; Neovim 0.7 has no
    -- handler for it, so refresh every buffer this client serves.
    ['workspace/codeLens/refresh'] = function(_, _, ctx)
      for _, bufnr in ipairs(vim.lsp.get_buffers_by_client_id(ctx.client_id)) do
        M.refresh_code_lens(bufnr)
      end
      return vim.NIL
    end,
  }
  return vim.tbl_extend('force', h, M.config.handlers or {})
end

--- Starts (or reuses) the server for the buffer's root and attaches the buffer to it.
--- Returns the client id.
function M.attach(bufnr)
  bufnr = (bufnr == nil or bufnr == 0) and vim.api.nvim_get_current_buf() or bufnr
  local name = vim.api.nvim_buf_get_name(bufnr)
  if name == '' then
    return nil
  end
  local root = M.root_dir(name)
  local id = clients[root]
  local client = id and vim.lsp.get_client_by_id(id)
  if not client or client.is_stopped() then
    id = vim.lsp.start_client({
      name = 'plumb',
      cmd = M.config.cmd,
      root_dir = root,
      workspace_folders = { { uri = vim.uri_from_fname(root), name = root } },
      capabilities = M.capabilities(),
      init_options = M.config.init_options,
      handlers = handlers(),
      -- A lens only shows a value (command plumb.showValue). Neovim's codelens.run() clears the
      -- lens before running it: handle the command here and show the lenses again.
      commands = {
        ['plumb.showValue'] = function(_, ctx)
          M.refresh_code_lens(ctx.bufnr)
        end,
      },
      flags = { exit_timeout = M.config.exit_timeout },
      on_attach = function(c, b)
        -- Completion with <C-x><C-o> (Neovim 0.7 has no built-in completion popup for LSP).
        vim.bo[b].omnifunc = 'v:lua.vim.lsp.omnifunc'
        if M.config.code_lens then
          M.refresh_code_lens(b)
        end
        -- Neovim versions that show inlay hints announce them, and the server then sends the
        -- values as inlay hints rather than code lenses: switch them on for the buffer.
        if type(vim.lsp.inlay_hint) == 'table' and type(vim.lsp.inlay_hint.enable) == 'function' then
          pcall(vim.lsp.inlay_hint.enable, true, { bufnr = b })
        end
        if M.config.on_attach then
          M.config.on_attach(c, b)
        end
      end,
    })
    if not id then
      vim.notify('plumb: could not start the language server: ' .. table.concat(M.config.cmd, ' '),
        vim.log.levels.ERROR)
      return nil
    end
    clients[root] = id
  end
  vim.lsp.buf_attach_client(bufnr, id)
  return id
end

--- The server's command that writes the printable report of a calc.
local WRITE_REPORT = 'plumb.writeReport'

--- The plumb client attached to a buffer, or nil.
local function client_of(bufnr)
  for _, c in pairs(vim.lsp.buf_get_clients(bufnr)) do
    if c.name == 'plumb' then
      return c
    end
  end
  return nil
end

--- Asks the server to write the report of a buffer's calc, made from the text as it is now
--- (saved or not). Calls on_done(err, result) with the server's answer: result.path,
--- result.uri, result.beside (false when it went to a temporary file) and result.message.
function M.write_report(bufnr, on_done)
  bufnr = (bufnr == nil or bufnr == 0) and vim.api.nvim_get_current_buf() or bufnr
  local client = client_of(bufnr)
  if not client then
    on_done({ message = 'this buffer is not a calc that Plumb serves (open a .plumb file)' }, nil)
    return
  end
  local params = { command = WRITE_REPORT, arguments = { vim.uri_from_bufnr(bufnr) } }
  client.request('workspace/executeCommand', params, function(err, result)
    on_done(err, result)
  end, bufnr)
end

--- :PlumbReport — writes the report and says where it is; opens it too where Neovim can
--- (vim.ui.open, from Neovim 0.10).
function M.report(bufnr)
  M.write_report(bufnr, function(err, result)
    if err then
      vim.notify('plumb: ' .. tostring(err.message), vim.log.levels.ERROR)
      return
    end
    vim.notify('plumb: ' .. result.message, vim.log.levels.INFO)
    if type(vim.ui.open) == 'function' then
      local _, open_err = vim.ui.open(result.path)
      if open_err then
        vim.notify('plumb: could not open the report: ' .. tostring(open_err), vim.log.levels.WARN)
      end
    end
  end)
end

--- Sets the options (merged over the defaults) and registers the autocommands.
function M.setup(opts)
  M.config = vim.tbl_deep_extend('force', vim.deepcopy(defaults), opts or {})
  local group = vim.api.nvim_create_augroup('plumb_lsp', { clear = true })
  vim.api.nvim_create_autocmd({ 'BufRead', 'BufNewFile' }, {
    group = group,
    pattern = '*.plumb',
    callback = function(args)
      vim.bo[args.buf].filetype = 'plumb'
    end,
  })
  vim.api.nvim_create_autocmd('FileType', {
    group = group,
    pattern = 'plumb',
    callback = function(args)
      vim.bo[args.buf].commentstring = '# %s'
      M.attach(args.buf)
    end,
  })
  vim.api.nvim_create_user_command('PlumbReport', function()
    M.report(0)
  end, { desc = "Write the printable report of this calc (beside it) and open it" })
  if M.config.code_lens then
    vim.api.nvim_create_autocmd({ 'BufEnter', 'InsertLeave' }, {
      group = group,
      pattern = '*.plumb',
      callback = function(args)
        if next(vim.lsp.buf_get_clients(args.buf)) then
          M.refresh_code_lens(args.buf)
        end
      end,
    })
  end
end

return M
