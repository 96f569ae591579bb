;;; cutsheet.el --- CutSheet language server for Emacs 28+ with eglot (the configuration docs/editors.md shows)
;; Put this file on your load-path and add (require 'cutsheet) to your init file.
;; CUTSHEET_CMD overrides the command (words separated by spaces), e.g. for a build that is not on PATH.
(require 'eglot)

(define-derived-mode cutsheet-mode prog-mode "CutSheet"
  "Major mode for CutSheet worksheets."
  (setq-local comment-start "// ")
  (setq-local comment-start-skip "//+\\s-*"))
(add-to-list 'auto-mode-alist '("\\.cutsheet\\'" . cutsheet-mode))

(add-to-list 'eglot-server-programs
             `(cutsheet-mode . (,@(split-string (or (getenv "CUTSHEET_CMD") "cutsheet lsp"))
                                :initializationOptions (:valueHints (:enabled t :includeInputs :json-false)))))
(add-hook 'cutsheet-mode-hook #'eglot-ensure)

(provide 'cutsheet)
