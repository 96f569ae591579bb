;;; check.el --- headless check of the eglot configuration: open a sheet, wait for the
;;; diagnostics, read a hover, format, edit a line and wait for the error to clear. Writes what
;;; came back to CUTSHEET_EMACS_OUT, one finding per line, and exits.
(require 'cutsheet)
(require 'flymake)

(defvar check-lines nil)
(defun check-say (fmt &rest args) (push (apply #'format fmt args) check-lines))
(defun check-finish ()
  (with-temp-file (getenv "CUTSHEET_EMACS_OUT")
    (insert (mapconcat #'identity (reverse check-lines) "\n") "\n"))
  (kill-emacs 0))

(defun check-wait (predicate seconds)
  "Runs timers and reads the server until PREDICATE holds or SECONDS pass; the last value of PREDICATE."
  (let ((deadline (+ (float-time) seconds)) (ok nil))
    (while (and (not (setq ok (funcall predicate))) (< (float-time) deadline))
      (accept-process-output nil 0.05)
      ;; Flymake and eglot's change notifications run on idle timers, which batch Emacs only
      ;; runs when asked.
      (run-hooks 'post-command-hook)
      (timer-event-handler-run-idle))
    ok))

(defun timer-event-handler-run-idle ()
  (dolist (timer (copy-sequence timer-idle-list))
    (timer-event-handler timer)))

(find-file "sheet.cutsheet")
;; eglot-ensure connects on the first command after the file opens; batch Emacs has no command loop.
(run-hooks 'post-command-hook)
(check-say "managed %s" (check-wait (lambda () (bound-and-true-p eglot--managed-mode)) 30))
(check-say "diagnostics %s" (and (check-wait (lambda () (flymake-diagnostics)) 30) t))
(dolist (d (flymake-diagnostics))
  (check-say "diagnostic %d: %s" (line-number-at-pos (flymake-diagnostic-beg d)) (flymake-diagnostic-text d)))
(let* ((server (eglot-current-server))
       (hover (jsonrpc-request server :textDocument/hover
                               (list :textDocument (eglot--TextDocumentIdentifier)
                                     :position (list :line 1 :character 0)))))
  (check-say "hover %s" (car (split-string (plist-get (plist-get hover :contents) :value) "\n"))))
;; Formatting aligns the = of the block's definitions.
(eglot-format-buffer)
(check-say "formatted %s" (buffer-substring-no-properties (point-min) (line-end-position)))
;; An edit reaches the server as an incremental change; the error must clear.
(goto-char (point-min))
(forward-line 2)
(delete-region (line-beginning-position) (line-end-position))
(insert "bad = 1 mm + 2 mm")
(check-say "cleared %s" (check-wait (lambda () (null (flymake-diagnostics))) 30))
(check-finish)
