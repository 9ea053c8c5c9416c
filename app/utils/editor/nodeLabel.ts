import type { ParamValue } from './blockCatalog'

type Params = Record<string, ParamValue>

function show(params: Params, values: Record<string, string> | undefined, key: string, unit = ''): string | undefined {
  const v = params[key]
  if (v === undefined) return undefined
  return values?.[key] ?? (typeof v === 'number' ? `${v}${unit}` : String(v))
}

function length(p: Params, values?: Record<string, string>): string | undefined {
  if (p.length !== undefined) return show(p, values, 'length', ' m')
  const deg = show(p, values, 'degrees', '°')
  const at = show(p, values, 'at', ' Hz')
  return deg && at ? `${deg} at ${at}` : deg
}

/** The short text beside a symbol: impedance and electrical length of a line, model of a hybrid… */
export function nodeLabel(type: string, p: Params, values?: Record<string, string>): string {
  const parts: Array<string | undefined> = []
  switch (type) {
    case 'line': case 'stub':
      parts.push(show(p, values, 'impedance', ' Ω'), length(p, values))
      break
    case 'coupled':
      parts.push(show(p, values, 'evenImpedance', ' Ω'), show(p, values, 'oddImpedance', ' Ω'), length(p, values))
      break
    case 'port': parts.push(show(p, values, 'impedance', ' Ω')); break
    case 'hybrid90': case 'hybrid180': case 'divider':
      parts.push(p.model === 'ideal' || p.model === undefined ? 'ideal' : `${p.model} at ${show(p, values, 'at', ' Hz') ?? '?'}`)
      break
    case 'phase': parts.push(show(p, values, 'degrees', '°')); break
    case 'attenuator': parts.push(show(p, values, 'db', ' dB')); break
    case 'load': case 'series':
      parts.push(p.end !== undefined ? String(p.end) : undefined, show(p, values, 'resistance', ' Ω'), show(p, values, 'inductance', ' H'), show(p, values, 'capacitance', ' F'))
      break
    case 'microstrip': parts.push(show(p, values, 'width', ' m'), show(p, values, 'length', ' m')); break
    case 'microstripOpen': parts.push(show(p, values, 'width', ' m')); break
    case 'microstripStep': parts.push(`${show(p, values, 'width1', ' m') ?? '?'} → ${show(p, values, 'width2', ' m') ?? '?'}`); break
    case 'coupledMicrostrip': parts.push(show(p, values, 'width', ' m'), show(p, values, 'gap', ' m'), show(p, values, 'length', ' m')); break
    case 'microstripTee': parts.push(`${show(p, values, 'mainWidth', ' m') ?? '?'} ⊥ ${show(p, values, 'branchWidth', ' m') ?? '?'}`); break
    case 'microstripBend': parts.push(show(p, values, 'width', ' m'), p.corner !== undefined ? String(p.corner) : undefined); break
  }
  return parts.filter(Boolean).join(' · ')
}
