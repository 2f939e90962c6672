#!/bin/bash
# completion/phlox.bash in a plain bash (no bash-completion package): the
# words offered for typical command lines, and its lists against the
# program: options = those of `phlox --help`, each command's options = those
# of `phlox COMMAND --help`, element symbols = the library's elements.
# shellcheck source=tests/packaging/common.sh
. "$(dirname "$0")/common.sh"
S=$(scratch completion)
mkdir -p "$S/work/studies" "$S/user/elements"
# shellcheck source=/dev/null
source "$PHLOX_SOURCE_DIR/completion/phlox.bash"
complete -p phlox | grep -q -- '-F _phlox' || fail "phlox has no completion function"

# complete LINE: the words offered for the last word of LINE (a trailing
# space starts an empty word), sorted, one per line.
complete_line() {
    local line=$1
    read -r -a COMP_WORDS <<<"$line"
    [[ $line == *" " ]] && COMP_WORDS+=("")
    COMP_WORDS[0]=$PHLOX_BIN
    COMP_CWORD=$((${#COMP_WORDS[@]} - 1))
    COMP_LINE=$line
    COMP_POINT=${#line}
    COMPREPLY=()
    _phlox
    printf '%s\n' "${COMPREPLY[@]}" | sort -u | sed '/^$/d'
}
expect() { # expect LINE WORD...: each WORD is offered
    local got line=$1
    shift
    got=$(complete_line "$line")
    for w in "$@"; do
        grep -qx -- "$w" <<<"$got" || fail "'$line' does not offer '$w' (offered: $(tr '\n' ' ' <<<"$got"))"
    done
}
refuse() { # refuse LINE WORD...: no WORD is offered
    local got line=$1
    shift
    got=$(complete_line "$line")
    for w in "$@"; do
        if grep -qx -- "$w" <<<"$got"; then fail "'$line' offers '$w'"; fi
    done
}

cd "$S/work"
touch study.lua notes.txt
expect "phlox re" reaction
expect "phlox " reaction check list study.lua studies
refuse "phlox " notes.txt
expect "phlox --" --path --version --help --
expect "phlox -p " studies
expect "phlox --path studies l" list
expect "phlox list F" Fe F
expect "phlox list " Zn Cu Cl H O
refuse "phlox list Zn " Zn
expect "phlox reaction 'Zn^2+ + 2 e- = Zn(s)' --" --temperature --pressure --json --help
refuse "phlox reaction x --temperature " --json
expect "phlox check " study.lua studies
refuse "phlox check " notes.txt
# elements from a --path folder count
echo 'return {}' >"$S/user/elements/Xq.lua" # never loaded: only its name is listed
expect "phlox --path $S/user list X" Xq
refuse "phlox list X" Xq

# The lists against the program.
opts_of() { # option names at the start of help lines
    sed -n 's/^  \(-[^ ,]*\(, -[^ ,]*\)*\).*/\1/p' | tr ',' '\n' | sed 's/ //g; s/=.*//' | sort -u
}
prog=$("$PHLOX_BIN" --help | opts_of)
comp=$(complete_line "phlox -" | sort -u)
[ "$prog" = "$comp" ] || fail "options: phlox --help has [$(echo $prog)], completion offers [$(echo $comp)]"
for c in reaction check list merge; do
    prog=$("$PHLOX_BIN" "$c" --help | opts_of)
    comp=$(complete_line "phlox $c -" | sort -u)
    [ "$prog" = "$comp" ] || fail "$c options: phlox $c --help has [$(echo $prog)], completion offers [$(echo $comp)]"
done
cmds=$("$PHLOX_BIN" --help | sed -n '/^commands:/,/^$/s/^  \([a-z][a-z]*\) .*/\1/p' | sort -u)
comp=$(complete_line "phlox " | grep -vE '\.lua$|^studies$' | sort -u)
[ "$cmds" = "$comp" ] || fail "commands: phlox --help has [$(echo $cmds)], completion offers [$(echo $comp)]"
els=$("$PHLOX_BIN" -e 'for _, e in ipairs(require("phlox").available_elements()) do print(e) end' | sort -u)
comp=$(complete_line "phlox list " | grep -vxE 'H|O' | sort -u)
[ "$els" = "$comp" ] || fail "elements: the library has [$(echo $els)], completion offers [$(echo $comp)]"
echo "-- completion agrees with phlox --help ($(wc -w <<<"$cmds") commands) and the library ($(wc -w <<<"$els") elements)"
