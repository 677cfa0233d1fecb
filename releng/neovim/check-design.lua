-- Drives Neovim's own protocol client against `bulwark lsp`, as an engineer's editor would: open a design,
-- wait for the diagnostics, take the first quick fix of the power finding, apply it, save. Writes what it saw
-- to the file named by BULWARK_NVIM_REPORT and quits with 0 on success, 1 otherwise.
local root = os.getenv('BULWARK_ROOT')
local design = os.getenv('BULWARK_DESIGN')
local report = io.open(os.getenv('BULWARK_NVIM_REPORT'), 'w')
local function say(s) report:write(s .. '\n'); report:flush() end
local function finish(code) report:close(); vim.cmd(code == 0 and 'qall!' or 'cquit!') end

local started = vim.loop.hrtime()
vim.cmd('edit ' .. design)
local buf = vim.api.nvim_get_current_buf()
local client = vim.lsp.start_client({
  name = 'bulwark',
  cmd = { root .. '/bulwark', 'lsp' },
  root_dir = vim.fn.fnamemodify(design, ':h'),
})
if not client then say('no client'); finish(1) return end
vim.lsp.buf_attach_client(buf, client)

local ok = vim.wait(120000, function()
  for _, d in ipairs(vim.diagnostic.get(buf)) do
    if d.code == 'resistor-power' then return true end
  end
  return false
end, 200)
if not ok then say('no resistor-power diagnostic'); finish(1) return end
say(string.format('first diagnostics %d ms after the server was started', (vim.loop.hrtime() - started) / 1e6))
local target
for _, d in ipairs(vim.diagnostic.get(buf)) do
  say('diagnostic ' .. (d.lnum + 1) .. ' [' .. tostring(d.code) .. ']: ' .. d.message)
  if d.code == 'resistor-power' then target = d end
end

local params = vim.lsp.util.make_range_params()
params.range = { start = { line = target.lnum, character = target.col },
                 ['end'] = { line = target.end_lnum, character = target.end_col } }
params.context = { diagnostics = { {
  range = params.range, message = target.message, code = target.code, severity = target.severity } } }
local results = vim.lsp.buf_request_sync(buf, 'textDocument/codeAction', params, 60000)
local applied = false
for _, res in pairs(results or {}) do
  for _, action in ipairs(res.result or {}) do
    if not applied and action.edit then
      say('code action: ' .. action.title)
      vim.lsp.util.apply_workspace_edit(action.edit, 'utf-16')
      applied = true
    end
  end
end
if not applied then say('no code action'); finish(1) return end
vim.cmd('write')
say('saved')
finish(0)
