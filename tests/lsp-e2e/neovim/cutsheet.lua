-- CutSheet language server for Neovim 0.7 and later (the configuration docs/editors.md shows).
-- Put this file in ~/.config/nvim/lua/ and add `require('cutsheet')` to init.lua.
-- CUTSHEET_CMD overrides the command (a list of words), e.g. for a build that is not on PATH.
local M = {}

local function command()
  local words = {}
  for w in string.gmatch(os.getenv('CUTSHEET_CMD') or 'cutsheet lsp', '%S+') do table.insert(words, w) end
  return words
end

vim.cmd([[autocmd BufRead,BufNewFile *.cutsheet setfiletype cutsheet]])

function M.attach(bufnr)
  if M.client_id == nil then
    M.client_id = vim.lsp.start_client({
      name = 'cutsheet',
      cmd = command(),
      root_dir = vim.fn.getcwd(),
      -- Neovim 0.7 shows no inlay hints; the server then sends the same texts as code lenses.
      init_options = { valueHints = { enabled = true, includeInputs = false } },
      -- Runs once the server has answered initialize and the buffer is attached.
      on_attach = function(_, buffer)
        vim.cmd(string.format([[autocmd BufEnter,InsertLeave,BufWritePost <buffer=%d> lua vim.lsp.codelens.refresh()]], buffer))
        vim.lsp.codelens.refresh()
      end,
    })
  end
  vim.lsp.buf_attach_client(bufnr, M.client_id)
end

vim.cmd([[autocmd FileType cutsheet lua require('cutsheet').attach(vim.api.nvim_get_current_buf())]])

return M
