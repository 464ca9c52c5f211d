/**
 * One ordering of table installs in the functions runtime. Each read of the stored table takes a
 * ticket when it starts, and each value the task pane hands over takes one when it is handed over;
 * a result is installed only when no result of a later ticket has been installed already. So the
 * table in use is always the one from the latest read or handover, whatever order the answers
 * arrive in, and an answer that comes late (after the time-out at start-up, say) is still used when
 * nothing newer was.
 */
export class InstallOrder {
  private issued = 0;
  private installed = 0;

  /**
   * A ticket for a read that starts now, or a value handed over now.
   *
   * Syntax: order.ticket()
   * Example: const t = order.ticket(); … order.install(t, () => use(value))
   */
  ticket(): number {
    return ++this.issued;
  }

  /**
   * Runs `apply` (synchronously, so nothing can come between the check and the install) when no later
   * ticket has installed anything; true when it ran. A ticket may install more than once (a time-out
   * first, the late answer after it).
   */
  install(ticket: number, apply: () => void): boolean {
    if (ticket < this.installed) return false;
    this.installed = ticket;
    apply();
    return true;
  }
}
