;;; plumb-mode.el --- Plumb calc files, with values and checks from Plumb's language server  -*- lexical-binding: t; -*-

;; A major mode for `.plumb' files and its registration with Eglot (Emacs 28 with the
;; `elpa-eglot' package, or Emacs 29 and later where Eglot is built in).
;;
;; Use:
;;   (add-to-list 'load-path "/path/to/plumb/editor-clients/emacs")
;;   (require 'plumb-mode)
;;   (setq plumb-server-command '("java" "-jar" "/path/to/plumb/server/target/plumb.jar" "lsp"))
;;   (add-hook 'plumb-mode-hook #'eglot-ensure)
;;
;; Eglot before 1.12 shows neither inlay hints nor code lenses, so the server sends each
;; line's value as a hint-level diagnostic (code `value'): Flymake lists them with the
;; problems, and `M-x flymake-show-buffer-diagnostics' shows every value of the calc.
;;
;; `M-x plumb-write-report' writes the printable report of the calc (beside it as NAME.html)
;; and opens it in a browser.

;;; Code:

(defgroup plumb nil
  "Plumb calc files."
  :group 'languages)

(defcustom plumb-server-command '("plumb" "lsp")
  "How to start Plumb's language server: a program and its arguments.
The default expects the repository's `plumb' launcher on the PATH; `java -jar
PLUMB_JAR lsp' works as well."
  :type '(repeat string))

(defvar plumb-mode-syntax-table
  (let ((table (make-syntax-table)))
    ;; `#' starts narrative or a comment that runs to the end of the line.
    (modify-syntax-entry ?# "<" table)
    (modify-syntax-entry ?\n ">" table)
    (modify-syntax-entry ?\" "\"" table)
    (modify-syntax-entry ?_ "_" table)
    table)
  "Syntax table of `plumb-mode'.")

(defconst plumb-mode--keywords
  '("input" "check" "seek" "from" "where" "use" "section" "title" "author"
    "reviewer" "revision" "correlation" "table" "end" "when" "otherwise" "source" "family"
    "basis" "valid" "domain" "regime" "accuracy" "interpolate" "accept" "at" "transition" "in" "as"
    "sweep" "over" "by" "steps" "log" "show" "case" "with" "spread")
  "Statement and clause words of the Plumb language.")

(defvar plumb-mode-font-lock-keywords
  `((,(regexp-opt plumb-mode--keywords 'symbols) . font-lock-keyword-face)
    ("^\\s-*\\(?:input\\s-+\\)?\\([[:alpha:]_][[:alnum:]_]*\\)\\s-*=" 1 font-lock-variable-name-face))
  "Highlighting of `plumb-mode': statement words and the names being defined.")

;;;###autoload
(define-derived-mode plumb-mode prog-mode "Plumb"
  "Major mode for Plumb calc files."
  :syntax-table plumb-mode-syntax-table
  (setq-local comment-start "# ")
  (setq-local comment-start-skip "#+\\s-*")
  (setq-local font-lock-defaults '(plumb-mode-font-lock-keywords)))

;;;###autoload
(add-to-list 'auto-mode-alist '("\\.plumb\\'" . plumb-mode))

(defcustom plumb-report-open t
  "Whether `plumb-write-report' opens the report it wrote.
It opens it with `browse-url-of-file'; when nil it only says where it is."
  :type 'boolean)

(defcustom plumb-report-timeout 60
  "Seconds `plumb-write-report' waits for the server to write the report."
  :type 'number)

(declare-function eglot-current-server "eglot")
(declare-function eglot--TextDocumentIdentifier "eglot")
(declare-function eglot--signal-textDocument/didChange "eglot")
(declare-function jsonrpc-request "jsonrpc")

(defun plumb-write-report ()
  "Write the printable report of this calc, open it, and return its file name.
Plumb's language server makes the report from the buffer's text as it is now,
saved or not, and writes it beside the calc as NAME.html, or to a temporary
file when the calc is not saved, lies outside its workspace or its folder
cannot be written; the echo area says where.  See `plumb-report-open'."
  (interactive)
  (require 'eglot)
  (let ((server (eglot-current-server)))
    (unless server
      (user-error "This buffer is not a calc that Plumb serves (open a .plumb file, then M-x eglot)"))
    ;; Eglot sends edits when Emacs is idle: send the latest now, so the report is of the text as it is.
    (when (fboundp 'eglot--signal-textDocument/didChange)
      (eglot--signal-textDocument/didChange))
    (let* ((result
            (condition-case err
                ;; The server's command plumb.writeReport, with the document as Eglot opened it;
                ;; `jsonrpc-request' itself rather than `eglot-execute-command', for a timeout
                ;; longer than jsonrpc's default 10 s (a large calc takes a while).
                (jsonrpc-request server :workspace/executeCommand
                                 (list :command "plumb.writeReport"
                                       :arguments (vector (plist-get (eglot--TextDocumentIdentifier) :uri)))
                                 :timeout plumb-report-timeout)
              (jsonrpc-error
               (user-error "Plumb: %s" (or (alist-get 'jsonrpc-error-message (cdr err)) (cadr err))))))
           (path (plist-get result :path)))
      (message "%s" (plist-get result :message))
      (when plumb-report-open
        (browse-url-of-file path))
      path)))

(with-eval-after-load 'eglot
  (add-to-list 'eglot-server-programs
               ;; A function, so that a later `setq' of `plumb-server-command' counts.
               (cons 'plumb-mode (lambda (&rest _) plumb-server-command))))

(provide 'plumb-mode)

;;; plumb-mode.el ends here
