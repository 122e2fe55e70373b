-- Headless Neovim as a client of the lonepair language server, with the Neovim 0.7 API
-- (vim.lsp.start_client + vim.lsp.buf_attach_client; vim.lsp.start only exists from 0.8).
--
-- Run as: nvim --headless --clean -n -c "luafile nvim-lsp-check.lua"
-- Environment:
--   LONEPAIR_SERVER       absolute path of dist/server.js
--   LONEPAIR_DOCUMENT     absolute path of the document to open
--   LONEPAIR_HOVER_WORDS  comma-separated words to hover on (the first match of each, as a whole word)
--   LONEPAIR_RESULT       file that receives the JSON report
--   LONEPAIR_WORKSPACE    absolute path of the project folder (the server's workspace folder)
--   LONEPAIR_TIMEOUT_MS   how long to wait for each step (default 10000)
--
-- Positions are reported as Neovim sees them: 0-based lines and 0-based byte columns for
-- diagnostics, and the UTF-16 position Neovim sent for each hover.

local server_path = os.getenv("LONEPAIR_SERVER")
local document_path = os.getenv("LONEPAIR_DOCUMENT")
local result_path = os.getenv("LONEPAIR_RESULT")
local workspace_path = os.getenv("LONEPAIR_WORKSPACE")
local hover_words = vim.split(os.getenv("LONEPAIR_HOVER_WORDS") or "", ",", { trimempty = true })
local timeout_ms = tonumber(os.getenv("LONEPAIR_TIMEOUT_MS") or "") or 10000

local report = {
  nvim_version = tostring(vim.version().major) .. "." .. vim.version().minor .. "." .. vim.version().patch,
  steps = {},
  diagnostics = {},
  hovers = {},
}

local function step(name)
  table.insert(report.steps, name)
end

local function write_report()
  local file = assert(io.open(result_path, "w"))
  file:write(vim.fn.json_encode(report))
  file:close()
end

-- Only plain fields: user_data and friends may hold values json_encode cannot take.
local function plain_diagnostic(diagnostic)
  return {
    lnum = diagnostic.lnum,
    col = diagnostic.col,
    end_lnum = diagnostic.end_lnum,
    end_col = diagnostic.end_col,
    severity = diagnostic.severity,
    code = diagnostic.code,
    source = diagnostic.source,
    message = diagnostic.message,
  }
end

-- Hover contents may be MarkupContent, a MarkedString or a list of them; report one text.
local function hover_text(contents)
  if type(contents) == "string" then
    return contents
  end
  if type(contents) ~= "table" then
    return ""
  end
  if contents.value ~= nil then
    return contents.value
  end
  local parts = {}
  for _, part in ipairs(contents) do
    table.insert(parts, hover_text(part))
  end
  return table.concat(parts, "\n")
end

-- Puts the cursor on the first whole-word match of `word`; answers the match, or nil.
local function cursor_on(word)
  vim.api.nvim_win_set_cursor(0, { 1, 0 })
  -- \V: the word is literal; \C: case matters (Co is not CO); \< \>: whole words only.
  local found = vim.fn.searchpos("\\V\\C\\<" .. word .. "\\>", "cW")
  if found[1] == 0 then
    return nil
  end
  vim.api.nvim_win_set_cursor(0, { found[1], found[2] - 1 })
  return found
end

local function hover_on(client, bufnr, word)
  local found = cursor_on(word)
  if not found then
    return { word = word, found = false }
  end
  local params = vim.lsp.util.make_position_params(0, client.offset_encoding)
  local response, err = client.request_sync("textDocument/hover", params, timeout_ms, bufnr)
  local entry = {
    word = word,
    found = true,
    line = found[1] - 1,
    byte_col = found[2] - 1,
    position = params.position,
  }
  if response == nil then
    entry.error = tostring(err)
  elseif response.err ~= nil then
    entry.error = vim.inspect(response.err)
  elseif response.result ~= nil and response.result ~= vim.NIL then
    entry.text = hover_text(response.result.contents)
  else
    entry.text = ""
  end
  return entry
end

-- The custom request an editor sends to export coordinates: position parameters as Neovim
-- builds them, plus the format (the README's example does the same).
local function coordinates_of(client, bufnr, word)
  if not cursor_on(word) then
    return { word = word, found = false }
  end
  local params = vim.lsp.util.make_position_params(0, client.offset_encoding)
  params.format = "xyz"
  local response, err = client.request_sync("lonepair/coordinates", params, timeout_ms, bufnr)
  if response == nil then
    return { word = word, error = tostring(err) }
  elseif response.err ~= nil then
    return { word = word, error = vim.inspect(response.err) }
  elseif response.result == nil or response.result == vim.NIL or response.result.file == nil then
    return { word = word, text = "" }
  end
  return { word = word, text = response.result.file.text, extension = response.result.file.extension }
end

-- The workspace check, run as the README's :LonepairCheckWorkspace runs it: the server's command,
-- which publishes the diagnostics of every file it checks. Reports the command's answer, the
-- diagnostics Neovim then holds for files in the workspace folder, and the progress titles seen.
local function check_workspace(client, bufnr)
  local response, err = client.request_sync(
    "workspace/executeCommand",
    { command = "lonepair.checkWorkspaceFolders", arguments = {} },
    timeout_ms,
    bufnr
  )
  if response == nil then
    return { error = tostring(err) }
  elseif response.err ~= nil then
    return { error = vim.inspect(response.err) }
  end
  local entry = { result = response.result, diagnostics = {}, progress_titles = {} }
  for _, diagnostic in ipairs(vim.diagnostic.get()) do
    local name = vim.api.nvim_buf_get_name(diagnostic.bufnr)
    if vim.startswith(name, workspace_path .. "/") then
      local plain = plain_diagnostic(diagnostic)
      plain.file = name:sub(#workspace_path + 2)
      table.insert(entry.diagnostics, plain)
    end
  end
  for _, progress in pairs(client.messages and client.messages.progress or {}) do
    table.insert(entry.progress_titles, progress.title)
  end
  return entry
end

local function run()
  assert(server_path and document_path and result_path, "LONEPAIR_SERVER, LONEPAIR_DOCUMENT and LONEPAIR_RESULT must be set")
  -- -u NONE / --clean leave file type detection off; the file type becomes the LSP languageId.
  vim.cmd("filetype on")
  vim.cmd("edit " .. vim.fn.fnameescape(document_path))
  local bufnr = vim.api.nvim_get_current_buf()
  report.filetype = vim.bo[bufnr].filetype
  step("opened")

  local client_id = vim.lsp.start_client({
    name = "lonepair",
    cmd = { "node", server_path, "--stdio" },
    root_dir = workspace_path or vim.fn.fnamemodify(document_path, ":p:h"),
  })
  assert(client_id, "vim.lsp.start_client did not start the server")
  assert(vim.lsp.buf_attach_client(bufnr, client_id), "vim.lsp.buf_attach_client failed")
  step("started")

  local client
  local initialized = vim.wait(timeout_ms, function()
    client = vim.lsp.get_client_by_id(client_id)
    return client ~= nil and client.initialized == true
  end, 20)
  assert(initialized, "the server did not finish initialize within " .. timeout_ms .. " ms")
  report.offset_encoding = client.offset_encoding
  report.hover_provider = client.server_capabilities.hoverProvider ~= nil
  step("initialized")

  local diagnosed = vim.wait(timeout_ms, function()
    return #vim.diagnostic.get(bufnr) > 0
  end, 20)
  assert(diagnosed, "no diagnostics arrived within " .. timeout_ms .. " ms")
  for _, diagnostic in ipairs(vim.diagnostic.get(bufnr)) do
    table.insert(report.diagnostics, plain_diagnostic(diagnostic))
  end
  step("diagnostics")

  for _, word in ipairs(hover_words) do
    table.insert(report.hovers, hover_on(client, bufnr, word))
  end
  step("hovers")

  if #hover_words > 0 then
    report.coordinates = coordinates_of(client, bufnr, hover_words[1])
  end
  step("coordinates")

  if workspace_path then
    report.workspace = check_workspace(client, bufnr)
  end
  step("workspace")

  client.stop()
  report.stopped = vim.wait(timeout_ms, function()
    return client.is_stopped()
  end, 20)
  step("stopped")
end

local ok, err = pcall(run)
if not ok then
  report.error = tostring(err)
end
local written, write_err = pcall(write_report)
if not written then
  io.stderr:write("could not write the report: " .. tostring(write_err) .. "\n")
end
-- A failed run exits non-zero so the test can tell a crash from a wrong answer.
vim.cmd(ok and written and "qa!" or "cq!")
