# bash completion for forme: commands, options, page descriptions, output
# files, palette names and starter kinds.
# Installed as share/bash-completion/completions/forme.

# File patterns below use @(a|b); bash-completion turns this on too.
shopt -s extglob

_forme() {
  local cur prev words cword
  if declare -F _init_completion >/dev/null; then
    _init_completion || return
  else
    cur=${COMP_WORDS[COMP_CWORD]}
    prev=${COMP_WORDS[COMP_CWORD-1]}
    words=("${COMP_WORDS[@]}")
    cword=$COMP_CWORD
  fi

  # Kept equal to forme's commands, palettes (all_palettes()) and starter
  # kinds by tests/outside/install_test.cpp.
  local commands="render watch check contrast palette schema new"
  local palettes="estuary fjord heath foreshore"
  local kinds="briefing report poster figure"
  local limits="description-bytes= yaml-anchors= yaml-aliases= yaml-expanded-nodes= nesting-depth= panels= table-bytes= pages= points-per-series= labels="

  # The command is the first word after forme that is not an option.
  local i command=""
  for ((i = 1; i < cword; i++)); do
    if [[ ${words[i]} != -* ]]; then
      command=${words[i]}
      break
    fi
  done

  if [[ -z $command ]]; then
    COMPREPLY=($(compgen -W "$commands --help --version" -- "$cur"))
    return
  fi

  # Positional words already given after the command.
  local given=0
  for ((i = i + 1; i < cword; i++)); do
    case ${words[i]} in
      -o | --output | --dpi | --limit) ((i++)) ;;
      -*) ;;
      *) ((given++)) ;;
    esac
  done

  case $command in
    render | watch)
      case $prev in
        -o | --output)
          COMPREPLY=($(compgen -f -X '!*.@(pdf|svg|png)' -- "$cur") $(compgen -d -- "$cur"))
          compopt -o filenames 2>/dev/null
          return
          ;;
        --dpi)
          COMPREPLY=($(compgen -W "72 150 300 600" -- "$cur"))
          return
          ;;
        --limit)
          COMPREPLY=($(compgen -W "$limits" -- "$cur"))
          compopt -o nospace 2>/dev/null
          return
          ;;
      esac
      if [[ $cur == -* ]]; then
        COMPREPLY=($(compgen -W "-o --output --dpi --limit --greyscale --quiet --help" -- "$cur"))
      else
        COMPREPLY=($(compgen -f -X '!*.@(yaml|yml)' -- "$cur") $(compgen -d -- "$cur"))
        compopt -o filenames 2>/dev/null
      fi
      ;;
    check)
      if [[ $prev == --limit ]]; then
        COMPREPLY=($(compgen -W "$limits" -- "$cur"))
        compopt -o nospace 2>/dev/null
      elif [[ $cur == -* ]]; then
        COMPREPLY=($(compgen -W "--strict --limit --greyscale --help" -- "$cur"))
      else
        COMPREPLY=($(compgen -f -X '!*.@(yaml|yml)' -- "$cur") $(compgen -d -- "$cur"))
        compopt -o filenames 2>/dev/null
      fi
      ;;
    palette)
      if ((given == 0)); then COMPREPLY=($(compgen -W "$palettes --help" -- "$cur")); fi
      ;;
    contrast)
      # A palette entry such as estuary.2, or a colour the author types.
      local entries="" p
      for p in $palettes; do entries+=" $p.1 $p.2 $p.3"; done
      COMPREPLY=($(compgen -W "$entries" -- "$cur"))
      ;;
    new)
      if ((given == 0)); then
        COMPREPLY=($(compgen -W "$kinds --help" -- "$cur"))
      else
        COMPREPLY=($(compgen -d -- "$cur"))
        compopt -o filenames 2>/dev/null
      fi
      ;;
    schema)
      COMPREPLY=($(compgen -W "--help" -- "$cur"))
      ;;
  esac
}

complete -F _forme forme
