# Sourced by the scripts in scripts/perf: sets $tool to the slotarray to time. TOOL=path/to/slotarray times that build;
# otherwise the tool as shipped for speed is published into "$work/tool": a ReadyToRun publish, whose tiered compilation
# is off (see src/SlotArray.Cli/SlotArray.Cli.csproj). Needs $repo and $work.
tool="${TOOL:-}"
if [[ -z "$tool" ]]; then
  dotnet publish "$repo/src/SlotArray.Cli" -c Release -r linux-x64 --self-contained false -p:PublishReadyToRun=true \
    -o "$work/tool" -v q -nologo >/dev/null
  tool="$work/tool/slotarray"
fi
