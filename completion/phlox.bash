# bash completion for phlox                                  -*- shell-script -*-
# Installed as share/bash-completion/completions/phlox; works without the
# bash-completion package too (`source completion/phlox.bash`).
# Completes the commands, the options (of phlox and of each command), element
# symbols (asked of phlox itself, so folders from --path and PHLOX_PATH
# count), Lua scripts, element files and folders.  Checked against
# `phlox --help` and `phlox COMMAND --help` by tests/packaging/test_completion.sh.

_phlox_commands="reaction check list merge"
_phlox_options="-e -i -p --path --shard -v --version -h --help --"
_phlox_reaction_options="-T --temperature -P --pressure --json -h --help"
_phlox_check_options="-h --help"
_phlox_list_options="-h --help"
_phlox_merge_options="-h --help"

# Element symbols of the library, with the --path folders given so far.
_phlox_elements()
{
    local prog=$1
    shift
    "$prog" "$@" -e 'for _, e in ipairs(require("phlox").available_elements()) do print(e) end' \
        2>/dev/null
}

_phlox()
{
    local cur prev prog i cmd=""
    cur=${COMP_WORDS[COMP_CWORD]}
    prev=${COMP_WORDS[COMP_CWORD - 1]}
    prog=${COMP_WORDS[0]}
    local -a paths=()
    COMPREPLY=()

    # Find the command (the first word that is not an option or an option's
    # argument) and the --path folders before it.
    for ((i = 1; i < COMP_CWORD; i++)); do
        case ${COMP_WORDS[i]} in
            -e | --shard) ((i++)) ;;
            -p | --path)
                paths+=(--path "${COMP_WORDS[i + 1]}")
                ((i++))
                ;;
            --path=*) paths+=("${COMP_WORDS[i]}") ;;
            --) ((i++)); break ;;
            -*) ;;
            *) break ;;
        esac
    done
    if ((i < COMP_CWORD)); then
        cmd=${COMP_WORDS[i]}
    fi

    case $cmd in
        reaction)
            case $prev in
                -T | --temperature | -P | --pressure) return 0 ;;
            esac
            if [[ $cur == -* ]]; then
                COMPREPLY=($(compgen -W "$_phlox_reaction_options" -- "$cur"))
            fi
            return 0
            ;;
        check)
            if [[ $cur == -* ]]; then
                COMPREPLY=($(compgen -W "$_phlox_check_options" -- "$cur"))
            else
                compopt -o filenames 2>/dev/null
                COMPREPLY=($(compgen -f -X '!*.lua' -- "$cur") $(compgen -d -- "$cur"))
            fi
            return 0
            ;;
        list)
            if [[ $cur == -* ]]; then
                COMPREPLY=($(compgen -W "$_phlox_list_options" -- "$cur"))
            elif ((COMP_CWORD == i + 1)); then
                COMPREPLY=($(compgen -W "$(_phlox_elements "$prog" "${paths[@]}") H O" -- "$cur"))
            fi
            return 0
            ;;
        merge)
            if [[ $cur == -* ]]; then
                COMPREPLY=($(compgen -W "$_phlox_merge_options" -- "$cur"))
            elif ((COMP_CWORD == i + 1)); then
                compopt -o filenames 2>/dev/null
                COMPREPLY=($(compgen -f -X '!*.lua' -- "$cur") $(compgen -d -- "$cur"))
            else
                compopt -o default 2>/dev/null
            fi
            return 0
            ;;
        "") ;;
        *)
            # a script: its arguments are its own business; offer files
            compopt -o default 2>/dev/null
            return 0
            ;;
    esac

    case $prev in
        -p | --path)
            compopt -o filenames 2>/dev/null
            COMPREPLY=($(compgen -d -- "$cur"))
            return 0
            ;;
        -e | --shard) return 0 ;;
    esac
    if [[ $cur == -* ]]; then
        COMPREPLY=($(compgen -W "$_phlox_options" -- "$cur"))
    else
        compopt -o filenames 2>/dev/null
        COMPREPLY=($(compgen -W "$_phlox_commands" -- "$cur")
            $(compgen -f -X '!*.lua' -- "$cur") $(compgen -d -- "$cur"))
    fi
    return 0
}
complete -F _phlox phlox
