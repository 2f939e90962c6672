--- phlox.cli: the commands of the phlox program (reaction, check, list).
-- Each takes the argument list after the command name and returns an exit
-- status: 0 success, 1 failure, 2 usage error.
local cli = {}

local commands = {}

function cli.run(name, args)
  local cmd = commands[name]
  if not cmd then
    io.stderr:write("phlox: unknown command '", tostring(name), "'\n")
    return 2
  end
  return cmd(args)
end

cli.commands = commands
return cli
