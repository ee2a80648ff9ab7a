;;; test.el --- Headless Eglot test of Plumb's language server  -*- lexical-binding: t; -*-

;; Run by run.sh as `emacs -Q --batch -l test.el', with
;;   PLUMB_JAR        the server jar (started as java -jar PLUMB_JAR lsp)
;;   PLUMB_WORKSPACE  a folder with a .git marker holding mast.plumb and site.plumb (see run.sh)
;;   PLUMB_EMACS_DIR  the folder holding plumb-mode.el
;; Works with Emacs 28 and Debian's elpa-eglot 1.9. In batch mode idle timers never fire, so
;; the test sends each edit itself (`eglot--signal-textDocument/didChange'), and reads the
;; diagnostics Eglot keeps for Flymake (`eglot--diagnostics'). Every wait is bounded.

;;; Code:

(require 'cl-lib)
(dolist (dir (file-expand-wildcards "/usr/share/emacs/site-lisp/elpa/*"))
  (add-to-list 'load-path dir))
(add-to-list 'load-path (getenv "PLUMB_EMACS_DIR"))
(require 'eglot)
(require 'plumb-mode)

(defconst plumb-test-wait-seconds 30)
(defvar plumb-test-passed 0)
(defvar plumb-test-failed 0)

(defun plumb-test-finish ()
  (princ (format "eglot-lsp: %d passed, %d failed\n" plumb-test-passed plumb-test-failed))
  (kill-emacs (if (> plumb-test-failed 0) 1 0)))

(defun plumb-test-check (name ok &optional detail)
  "Counts and prints one check; the test goes on either way."
  (if ok
      (progn (cl-incf plumb-test-passed) (princ (format "ok   %s\n" name)))
    (cl-incf plumb-test-failed)
    (princ (format "FAIL %s%s\n" name (if detail (format "\n     %S" detail) ""))))
  ok)

(defun plumb-test-wait (what predicate)
  "Waits until PREDICATE holds; a timeout fails the test and ends it."
  (let ((deadline (+ (float-time) plumb-test-wait-seconds)))
    (while (and (not (funcall predicate)) (< (float-time) deadline))
      (accept-process-output nil 0.05))
    (unless (funcall predicate)
      (plumb-test-check (format "waiting for %s" what) nil "timed out")
      (plumb-test-finish))))

(defun plumb-test-diags (code)
  "The Flymake diagnostics Eglot holds for this buffer whose code is CODE."
  (cl-remove-if-not (lambda (d) (string-match-p (regexp-quote (format "[%s]" code)) (flymake-diagnostic-text d)))
                    eglot--diagnostics))

(defun plumb-test-goto (needle &optional skip)
  "Moves point to the first NEEDLE in the buffer, plus SKIP characters."
  (goto-char (point-min))
  (unless (search-forward needle nil t) (error "fixture: %s not found" needle))
  (goto-char (+ (match-beginning 0) (or skip 0))))

(defun plumb-test-request (method params)
  (jsonrpc-request (eglot--current-server-or-lose) method params))

(defun plumb-test-edited ()
  "Sends the buffer's pending changes now: idle timers do not run in batch mode."
  (eglot--signal-textDocument/didChange))

(setq plumb-server-command (list "java" "-jar" (getenv "PLUMB_JAR") "lsp"))
(setq eglot-sync-connect t
      eglot-connect-timeout plumb-test-wait-seconds)

(condition-case err
    (let ((ws (getenv "PLUMB_WORKSPACE")))
      (find-file (expand-file-name "mast.plumb" ws))
      (plumb-test-check "a .plumb file opens in plumb-mode" (eq major-mode 'plumb-mode) major-mode)
      (apply #'eglot (eglot--guess-contact nil))
      (plumb-test-wait "Eglot to manage the buffer" (lambda () eglot--managed-mode))
      (plumb-test-check "the server says it is plumb"
                        (equal (plist-get (eglot--server-info (eglot--current-server-or-lose)) :name) "plumb")
                        (eglot--server-info (eglot--current-server-or-lose)))

      ;; (1) The unit mismatch after 𝑥 (two UTF-16 units) and µ, ρ: Eglot's own column
      ;; conversion must land on exactly the expression.
      (plumb-test-wait "a unit.mismatch diagnostic" (lambda () (plumb-test-diags "unit.mismatch")))
      (let ((d (car (plumb-test-diags "unit.mismatch"))))
        (plumb-test-check "unit.mismatch covers exactly `ρ_air + 3 mm' after 𝑥_µ"
                          (equal (buffer-substring-no-properties (flymake-diagnostic-beg d) (flymake-diagnostic-end d))
                                 "ρ_air + 3 mm")
                          (buffer-substring-no-properties (flymake-diagnostic-beg d) (flymake-diagnostic-end d)))
        (plumb-test-check "unit.mismatch is an error for Flymake" (eq (flymake-diagnostic-type d) 'eglot-error)
                          (flymake-diagnostic-type d)))

      ;; (2) Eglot 1.9 has neither inlay hints nor code lenses: values come as hint diagnostics.
      (let* ((values (plumb-test-diags "value"))
             (q-line (progn (plumb-test-goto "q = 0.5") (line-number-at-pos)))
             (on-q (cl-find-if (lambda (d) (= (line-number-at-pos (flymake-diagnostic-beg d)) q-line)) values)))
        (plumb-test-check "values arrive as notes, one on the line of q" (and on-q (eq (flymake-diagnostic-type on-q) 'eglot-note))
                          (mapcar #'flymake-diagnostic-text values))
        (plumb-test-check "the note on q gives its value in Pa"
                          (and on-q (string-match-p "= 351\\.4 Pa" (flymake-diagnostic-text on-q)))
                          (and on-q (flymake-diagnostic-text on-q))))

      ;; (3) Hover on ρ_air in the line after 𝑥_µ.
      (plumb-test-goto "+ 3 mm" -5)
      (let* ((hover (plumb-test-request :textDocument/hover (eglot--TextDocumentPositionParams)))
             (md (plist-get (plist-get hover :contents) :value)))
        (plumb-test-check "hover on ρ_air shows its value" (and md (string-match-p "\\*\\*ρ_air\\*\\* = 1\\.22 kg/m³" md)) md))

      ;; (4) Go to definition: V_gust lives in the used file.
      (plumb-test-goto "V_gust^2")
      (let* ((xrefs (xref-backend-definitions 'eglot (xref-backend-identifier-at-point 'eglot)))
             (loc (and xrefs (xref-item-location (car xrefs)))))
        (plumb-test-check "definition of V_gust is line 2 of site.plumb"
                          (and loc (string-suffix-p "site.plumb" (xref-location-group loc))
                               (= (xref-location-line loc) 2))
                          (and loc (list (xref-location-group loc) (xref-location-line loc)))))

      ;; (5) An edit after non-ASCII text: the mismatch goes, and the value note follows.
      (plumb-test-goto "3 mm")
      (delete-region (point) (+ (point) 4))
      (insert "0.2 kg/m^3")
      (plumb-test-edited)
      (plumb-test-wait "the mismatch to clear" (lambda () (null (plumb-test-diags "unit.mismatch"))))
      (plumb-test-check "after the edit the line's note reads 1.42 kg/m³"
                        (cl-some (lambda (d) (string-match-p "1\\.42 kg/m³" (flymake-diagnostic-text d)))
                                 (plumb-test-diags "value"))
                        (mapcar #'flymake-diagnostic-text (plumb-test-diags "value")))

      ;; (6) Completion: names in scope with their values.
      (goto-char (point-max))
      (insert "F_x = V_g")
      (plumb-test-edited)
      (let* ((result (plumb-test-request :textDocument/completion (eglot--TextDocumentPositionParams)))
             (items (if (vectorp result) result (plist-get result :items)))
             (labels (mapcar (lambda (i) (plist-get i :label)) items)))
        (plumb-test-check "completion after V_g offers V_gust" (member "V_gust" labels) labels))
      (delete-region (line-beginning-position) (point-max))
      (plumb-test-edited)

      ;; (7) Formatting lines up the block of inputs and touches nothing else.
      (let ((before (replace-regexp-in-string "[ \t]+" "" (buffer-string))))
        (eglot-format-buffer)
        (plumb-test-check "formatting changes only blanks"
                          (equal before (replace-regexp-in-string "[ \t]+" "" (buffer-string))))
        (plumb-test-check "formatting joins `input  h_lamp' with one blank"
                          (not (string-match-p "input  h_lamp" (buffer-string))))
        (let ((columns (delete-dups
                        (mapcar (lambda (n) (plumb-test-goto n) (search-forward "=") (current-column))
                                '("input ρ_air" "input d_lamp" "input Cd" "input h_lamp")))))
          (plumb-test-check "the = signs of the inputs share one column" (= (length columns) 1) columns)))
      (plumb-test-edited)

      ;; (8) Rename ρ_air everywhere it is used.
      (plumb-test-goto "ρ_air")
      (eglot-rename "ρ_sea")
      (plumb-test-check "rename ρ_air → ρ_sea leaves no ρ_air and four ρ_sea"
                        (and (not (string-match-p "ρ_air" (buffer-string)))
                             (= 4 (how-many "ρ_sea" (point-min) (point-max))))
                        (buffer-string))

      ;; (9) Code actions: the library correlation valid at this Reynolds number.
      (plumb-test-edited)
      (plumb-test-wait "a range.outside warning" (lambda () (plumb-test-diags "range.outside")))
      (let* ((d (car (plumb-test-diags "range.outside")))
             (actions (plumb-test-request :textDocument/codeAction
                                          (list :textDocument (eglot--TextDocumentIdentifier)
                                                :range (list :start (eglot--pos-to-lsp-position (flymake-diagnostic-beg d))
                                                             :end (eglot--pos-to-lsp-position (flymake-diagnostic-end d)))
                                                :context (list :diagnostics [])))))
        (plumb-test-check "a code action offers a correlation valid at this Re"
                          (cl-some (lambda (a) (string-match-p "^Use .*, valid here" (plist-get a :title))) actions)
                          (mapcar (lambda (a) (plist-get a :title)) actions)))

      ;; (10) The printable report of the calc as typed: an unsaved edit of its title is in it.
      (plumb-test-goto "Buoy mast lamp" (length "Buoy mast lamp"))
      ;; Not sent on purpose: the command itself sends the pending edit before it asks.
      (insert " (unsaved)")
      (let* ((report (file-truename (expand-file-name "mast.html" ws)))
             (opened nil)
             (said nil)
             (browse-url-browser-function (lambda (url &rest _) (setq opened url)))
             (path (cl-letf* ((message-function (symbol-function 'message))
                              ((symbol-function 'message)
                               (lambda (format &rest args)
                                 (push (apply #'format-message format args) said)
                                 (apply message-function format args))))
                     (plumb-write-report)))
             (html (and path (file-exists-p path)
                        (with-temp-buffer (insert-file-contents path) (buffer-string)))))
        (plumb-test-check "plumb-write-report writes mast.html beside the calc" (equal path report) path)
        (plumb-test-check "it says where the report went"
                          (member (concat "Wrote the report of mast.plumb beside it: " report) said) said)
        (plumb-test-check "the report holds the title as typed in the buffer"
                          (and html (string-search
                                     "<title>Buoy mast lamp (unsaved): wind drag (editor test, invented data)</title>" html))
                          (and html (substring html 0 (min 400 (length html)))))
        (plumb-test-check "mast.plumb on disk still has the saved title"
                          (with-temp-buffer
                            (insert-file-contents (expand-file-name "mast.plumb" ws))
                            (search-forward "\"Buoy mast lamp: wind" nil t)))
        (plumb-test-check "the report is opened in the browser" (equal opened (browse-url-file-url report)) opened))
      (let ((refusal (condition-case err
                         (progn (plumb-test-request :workspace/executeCommand
                                                    '(:command "plumb.writeReport" :arguments []))
                                nil)
                       (jsonrpc-error (cons (alist-get 'jsonrpc-error-code (cdr err))
                                            (alist-get 'jsonrpc-error-message (cdr err)))))))
        (plumb-test-check "plumb.writeReport without the URI is refused with a sentence"
                          (equal refusal (cons -32602 "plumb.writeReport needs the calc's document URI as its argument, e.g. [\"file:///work/pod.plumb\"]"))
                          refusal))
      (with-temp-buffer
        (let ((refusal (condition-case err (progn (plumb-write-report) nil) (error err))))
          (plumb-test-check "plumb-write-report outside a calc says why it cannot"
                            (equal refusal '(user-error "This buffer is not a calc that Plumb serves (open a .plumb file, then M-x eglot)"))
                            refusal))))
  (error (plumb-test-check "the test ran to its end" nil err)))

(plumb-test-finish)

;;; test.el ends here
