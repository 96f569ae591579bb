-- Headless check of the Neovim configuration: open a sheet, wait for diagnostics, ask for a
-- hover and code lenses, write what came back to CUTSHEET_NVIM_OUT and quit.
local out = os.getenv('CUTSHEET_NVIM_OUT')
local lines = {}
local function say(s) table.insert(lines, s) end

local function finish()
  local f = io.open(out, 'w'); f:write(table.concat(lines, '\n') .. '\n'); f:close()
  vim.cmd('qall!')
end

local bufnr = vim.api.nvim_get_current_buf()
local ok = vim.wait(15000, function() return #vim.diagnostic.get(bufnr) > 0 end, 50)
say('diagnostics ' .. tostring(ok))
for _, d in ipairs(vim.diagnostic.get(bufnr)) do
  say(string.format('diagnostic %d:%d %s %s', d.lnum, d.col, tostring(d.code or (d.user_data and d.user_data.lsp and d.user_data.lsp.code)), d.message))
end
local hover = vim.lsp.buf_request_sync(bufnr, 'textDocument/hover',
  { textDocument = { uri = vim.uri_from_bufnr(bufnr) }, position = { line = 1, character = 0 } }, 5000)
for _, r in pairs(hover or {}) do
  if r.result then say('hover ' .. r.result.contents.value:gsub('\n.*', '')) end
end
local lenses = vim.lsp.buf_request_sync(bufnr, 'textDocument/codeLens', { textDocument = { uri = vim.uri_from_bufnr(bufnr) } }, 5000)
for _, r in pairs(lenses or {}) do
  for _, l in ipairs(r.result or {}) do say('lens ' .. l.command.title) end
end
-- An edit in insert mode reaches the server as an incremental change; the error must clear.
vim.api.nvim_buf_set_lines(bufnr, 2, 3, false, { 'bad = 1 mm + 2 mm' })
ok = vim.wait(15000, function() return #vim.diagnostic.get(bufnr) == 0 end, 50)
say('cleared ' .. tostring(ok))
finish()
