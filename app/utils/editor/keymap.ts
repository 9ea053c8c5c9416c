/**
 * Portwright's key scheme, in one table: the key handler reads it and the help
 * overlay (`?`) lists it, so the two cannot drift apart.
 */

export type EditorAction =
  | 'help' | 'escape' | 'undo' | 'redo' | 'copy' | 'paste' | 'duplicate' | 'delete' | 'selectAll'
  | 'selectNext' | 'selectPrevious' | 'turnClockwise' | 'turnAnticlockwise' | 'mirror'
  | 'nudgeLeft' | 'nudgeRight' | 'nudgeUp' | 'nudgeDown' | 'jumpLeft' | 'jumpRight' | 'jumpUp' | 'jumpDown'
  | 'zoomIn' | 'zoomOut' | 'fit' | 'tidy' | 'focusRail' | 'focusWires' | 'settings' | 'save'
  | 'addMarker' | 'removeMarker' | 'markerLeft' | 'markerRight' | 'markerJumpLeft' | 'markerJumpRight'
  | 'viewResponse' | 'viewSmith' | 'viewBalance' | 'viewTable' | 'viewSpec' | 'viewArray' | 'viewEvenOdd'

export interface KeyBinding {
  /** Normalised combos, e.g. "mod+z", "shift+t", "arrowleft". */
  combos: string[]
  /** What the help overlay shows. */
  label: string
  action: EditorAction
  description: string
  group: 'Canvas' | 'Blocks' | 'Results' | 'Document'
  /** Changes the document: ignored for read-only users. */
  edits?: boolean
}

export const keymap: readonly KeyBinding[] = [
  { combos: ['?', 'shift+?'], label: '?', action: 'help', description: 'Show or hide this list', group: 'Document' },
  { combos: ['escape'], label: 'Esc', action: 'escape', description: 'Close a panel, or clear the selection', group: 'Canvas' },
  { combos: ['a'], label: 'A', action: 'focusRail', description: 'Go to the block rail (↑ ↓ to choose, Enter to place)', group: 'Blocks', edits: true },
  { combos: ['w'], label: 'W', action: 'focusWires', description: 'Go to the wire pickers of the selected block', group: 'Blocks', edits: true },
  { combos: ['n'], label: 'N', action: 'selectNext', description: 'Select the next block', group: 'Canvas' },
  { combos: ['shift+n'], label: 'Shift N', action: 'selectPrevious', description: 'Select the previous block', group: 'Canvas' },
  { combos: ['mod+a'], label: 'Ctrl A', action: 'selectAll', description: 'Select everything', group: 'Canvas' },
  { combos: ['t'], label: 'T', action: 'turnClockwise', description: 'Turn the selection a quarter clockwise', group: 'Blocks', edits: true },
  { combos: ['shift+t'], label: 'Shift T', action: 'turnAnticlockwise', description: 'Turn the selection a quarter anticlockwise', group: 'Blocks', edits: true },
  { combos: ['h'], label: 'H', action: 'mirror', description: 'Mirror the selection left to right', group: 'Blocks', edits: true },
  { combos: ['arrowleft'], label: '←', action: 'nudgeLeft', description: 'Move the selection one grid step', group: 'Blocks', edits: true },
  { combos: ['arrowright'], label: '→', action: 'nudgeRight', description: 'Move the selection one grid step', group: 'Blocks', edits: true },
  { combos: ['arrowup'], label: '↑', action: 'nudgeUp', description: 'Move the selection one grid step', group: 'Blocks', edits: true },
  { combos: ['arrowdown'], label: '↓', action: 'nudgeDown', description: 'Move the selection one grid step', group: 'Blocks', edits: true },
  { combos: ['shift+arrowleft'], label: 'Shift ←', action: 'jumpLeft', description: 'Move the selection five grid steps', group: 'Blocks', edits: true },
  { combos: ['shift+arrowright'], label: 'Shift →', action: 'jumpRight', description: 'Move the selection five grid steps', group: 'Blocks', edits: true },
  { combos: ['shift+arrowup'], label: 'Shift ↑', action: 'jumpUp', description: 'Move the selection five grid steps', group: 'Blocks', edits: true },
  { combos: ['shift+arrowdown'], label: 'Shift ↓', action: 'jumpDown', description: 'Move the selection five grid steps', group: 'Blocks', edits: true },
  { combos: ['delete', 'backspace'], label: 'Delete', action: 'delete', description: 'Delete the selected blocks and wires', group: 'Blocks', edits: true },
  { combos: ['mod+c'], label: 'Ctrl C', action: 'copy', description: 'Copy the selected blocks', group: 'Blocks' },
  { combos: ['mod+v'], label: 'Ctrl V', action: 'paste', description: 'Paste (with fresh names and port numbers)', group: 'Blocks', edits: true },
  { combos: ['mod+d'], label: 'Ctrl D', action: 'duplicate', description: 'Duplicate the selection', group: 'Blocks', edits: true },
  { combos: ['mod+z'], label: 'Ctrl Z', action: 'undo', description: 'Undo', group: 'Document', edits: true },
  { combos: ['mod+shift+z', 'mod+y'], label: 'Ctrl Shift Z', action: 'redo', description: 'Redo', group: 'Document', edits: true },
  { combos: ['mod+s'], label: 'Ctrl S', action: 'save', description: 'Save now', group: 'Document', edits: true },
  { combos: ['s'], label: 'S', action: 'settings', description: 'Open sweep and variables', group: 'Document' },
  { combos: ['=', '+', 'shift++'], label: '+', action: 'zoomIn', description: 'Zoom in', group: 'Canvas' },
  { combos: ['-'], label: '−', action: 'zoomOut', description: 'Zoom out', group: 'Canvas' },
  { combos: ['0'], label: '0', action: 'fit', description: 'Fit the network in view', group: 'Canvas' },
  { combos: ['l'], label: 'L', action: 'tidy', description: 'Tidy: lay the network out left to right, wires routed around blocks', group: 'Canvas', edits: true },
  { combos: ['m'], label: 'M', action: 'addMarker', description: 'Place a frequency marker mid-sweep', group: 'Results' },
  { combos: ['shift+m'], label: 'Shift M', action: 'removeMarker', description: 'Remove the active marker', group: 'Results' },
  { combos: [','], label: ',', action: 'markerLeft', description: 'Move the active marker one sweep point down', group: 'Results' },
  { combos: ['.'], label: '.', action: 'markerRight', description: 'Move the active marker one sweep point up', group: 'Results' },
  { combos: ['shift+<', '<'], label: '<', action: 'markerJumpLeft', description: 'Move the active marker ten points down', group: 'Results' },
  { combos: ['shift+>', '>'], label: '>', action: 'markerJumpRight', description: 'Move the active marker ten points up', group: 'Results' },
  { combos: ['alt+1'], label: 'Alt 1', action: 'viewResponse', description: 'Results: Response', group: 'Results' },
  { combos: ['alt+2'], label: 'Alt 2', action: 'viewSmith', description: 'Results: Smith chart', group: 'Results' },
  { combos: ['alt+3'], label: 'Alt 3', action: 'viewBalance', description: 'Results: Balance', group: 'Results' },
  { combos: ['alt+4'], label: 'Alt 4', action: 'viewTable', description: 'Results: Table', group: 'Results' },
  { combos: ['alt+5'], label: 'Alt 5', action: 'viewSpec', description: 'Results: Spec', group: 'Results' },
  { combos: ['alt+6'], label: 'Alt 6', action: 'viewArray', description: 'Results: Array (beams)', group: 'Results' },
  { combos: ['alt+7'], label: 'Alt 7', action: 'viewEvenOdd', description: 'Results: Even/odd modes', group: 'Results' },
]

/** The normalised combo of a key event: "mod+" for Ctrl or ⌘, then "alt+", "shift+", then the key (digits by their key code, so Alt+1 works everywhere). */
export function comboOf(e: { key: string, code?: string, ctrlKey: boolean, metaKey: boolean, altKey: boolean, shiftKey: boolean }): string {
  let key = e.key.toLowerCase()
  if (e.altKey && e.code?.startsWith('Digit')) key = e.code.slice(5)
  return `${e.ctrlKey || e.metaKey ? 'mod+' : ''}${e.altKey ? 'alt+' : ''}${e.shiftKey ? 'shift+' : ''}${key}`
}

const byCombo = new Map(keymap.flatMap(b => b.combos.map(c => [c, b] as const)))

/** The binding for a key event, if any. */
export function bindingFor(e: Parameters<typeof comboOf>[0]): KeyBinding | undefined {
  return byCombo.get(comboOf(e))
}
